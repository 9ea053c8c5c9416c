/** What each design assistant is asked; frequencies in Hz, impedances in Ω, levels in dB. */
export interface QuadratureAsk { frequency: number; impedance: number; couplingDb?: number; sections?: 1 | 2 | 3 }
export interface RingAsk { frequency: number; impedance: number }
export interface DividerAsk { frequency: number; impedance: number; ratioDb?: number }
export interface TransformerAsk { frequency: number; impedance: number; load: number; sections: number; response: 'binomial' | 'chebyshev'; maxReflection?: number }
export interface CoupledLineAsk { frequency: number; impedance: number; couplingDb: number }

/** The assistants by the KIND the design command takes. */
export type DesignKind = 'quadrature' | 'ring' | 'divider' | 'transformer' | 'coupled-line'

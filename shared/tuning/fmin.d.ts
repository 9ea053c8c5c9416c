// The fmin package ships no types; these cover the one function Portwright uses, from its ES source file.
declare module 'fmin/src/nelderMead.js' {
  /** A point of the simplex; fmin stores the objective's value on it. */
  export type NelderMeadPoint = number[] & { fx?: number }
  export interface NelderMeadParameters {
    maxIterations?: number
    /** Initial simplex: each non-zero coordinate multiplied by this. @default 1.05 */
    nonZeroDelta?: number
    /** Initial simplex: each zero coordinate set to this. @default 0.001 */
    zeroDelta?: number
    /** Stops when the objective's spread over the simplex and its size fall below this. @default 1e-6 */
    minErrorDelta?: number
    rho?: number
    chi?: number
    psi?: number
    sigma?: number
  }
  /** Minimises f from x0 by the Nelder–Mead simplex method. */
  export function nelderMead(f: (x: number[]) => number, x0: number[], parameters?: NelderMeadParameters): { fx: number; x: number[] }
}

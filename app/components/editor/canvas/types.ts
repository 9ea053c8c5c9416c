/**
 * Data interfaces of the canvas nodes, one per block kind. Every node gets
 * the placed terminals and orientation (BlockNodeData); the kind-specific
 * part narrows the parameters the symbol and its label read.
 */
import type { BlockNodeData } from '~~/app/utils/editor/flowModel'
import type { ParamValue } from '~~/app/utils/editor/blockCatalog'

type Param = ParamValue | undefined

interface Typed<P> extends BlockNodeData {
  block: BlockNodeData['block'] & { params: P & Record<string, ParamValue> }
  /** Evaluated values for the label ("35.36 Ω"), by parameter. */
  values?: Record<string, string>
}

export type PortNodeData = Typed<{ index?: Param, impedance?: Param }>
export type LineNodeData = Typed<{ impedance?: Param, degrees?: Param, at?: Param, length?: Param, velocityFactor?: Param, lossDb?: Param }>
export type StubNodeData = Typed<{ impedance?: Param, degrees?: Param, at?: Param, length?: Param, end?: Param }>
export type LoadNodeData = Typed<{ resistance?: Param, inductance?: Param, capacitance?: Param, end?: Param }>
export type SeriesNodeData = LoadNodeData
export type Hybrid90NodeData = Typed<{ impedance?: Param, model?: Param, at?: Param, couplingDb?: Param }>
export type CoupledNodeData = Typed<{ evenImpedance?: Param, oddImpedance?: Param, degrees?: Param, at?: Param, length?: Param, velocityFactor?: Param, lossDb?: Param }>
export type Hybrid180NodeData = Typed<{ impedance?: Param, model?: Param, at?: Param }>
export type DividerNodeData = Typed<{ impedance?: Param, model?: Param, at?: Param, ratioDb?: Param }>
export type PhaseNodeData = Typed<{ impedance?: Param, degrees?: Param }>
export type AttenuatorNodeData = Typed<{ impedance?: Param, db?: Param }>
export type MicrostripNodeData = Typed<{ substrate?: Param, width?: Param, length?: Param }>
export type MicrostripOpenNodeData = Typed<{ substrate?: Param, width?: Param }>
export type MicrostripStepNodeData = Typed<{ substrate?: Param, width1?: Param, width2?: Param }>
export type CoupledMicrostripNodeData = Typed<{ substrate?: Param, width?: Param, gap?: Param, length?: Param }>
export type MicrostripTeeNodeData = Typed<{ substrate?: Param, mainWidth?: Param, branchWidth?: Param }>
export type MicrostripBendNodeData = Typed<{ substrate?: Param, width?: Param, corner?: Param }>
export type GenericNodeData = Typed<Record<string, Param>>

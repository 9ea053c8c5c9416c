/** The network document contract in code: types, structural schema, evaluation of values, topology checks. */
export type { BlockLayout, BlockSpec, DocumentVersion, Evaluated, EvaluatedValue, NetworkDocument, ParamValue, Problem, SpecBand, SpecConditionSpec, SpecDocument, Substrate, Sweep, ToleranceSpec, TunableSpec, Wire } from './types'
export { blockLayoutSchema, blockSpecSchema, networkDocumentSchema, parseNetworkDocument, specConditionSchema, specDocumentSchema, substrateSchema, sweepSchema, tolerancesSchema, tunablesSchema, wireSchema, type ParseResult } from './schema'
export { evaluateQuantity, parseExpression, type Scope } from './expression'
export { evaluateVariables, type VariablesOutcome } from './variables'
export { evaluateParams, type ParamSpec, type ParamValues } from './params'
export { checkTopology, type TopologyInfo } from './topology'
export { formatQuantity } from './format-quantity'
export { QUANTITIES, type QuantityKind } from './quantities'

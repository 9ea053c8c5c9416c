import { DOCUMENT_LIMITS } from '../network/limits'
import { evaluateQuantity } from '../network/expression'
import { formatQuantity } from '../network/format-quantity'
import { evaluateParams, type ParamValues } from '../network/params'
import { parseNetworkDocument } from '../network/schema'
import { checkTopology } from '../network/topology'
import type { Evaluated, NetworkDocument, Problem } from '../network/types'
import { evaluateSubstrates } from '../network/substrates'
import { evaluateVariables, type VariablesOutcome } from '../network/variables'
import { BLOCK_MODELS, LATER_BLOCK_TYPES } from './blocks/registry'
import { CompiledNetwork, type CompileBlock } from './compile'
import type { JoinOrder } from './join-order'
import type { JoinPlanCache } from './plan-cache'
import type { SweepSettings } from './sweep'
import { resolveDataSet } from './resolve-data'
import type { CreateContext, DataSet, NestedOutcome, SubstrateLookup } from './types'

/** Loads the document a `subnetwork` block refers to; `trail` lists the references from the top document down. */
export type SubnetworkResolver = (ref: string, trail: readonly string[]) => unknown

/**
 * Loads the data set a `data` block refers to (a parsed Touchstone file, say); `trail` lists the
 * subnetwork references from the top document down to the one holding the block. May throw a
 * TouchstoneError (reported with its line) or any error (reported by its message).
 */
export type DataResolver = (ref: string, trail: readonly string[]) => DataSet | undefined

/** Options of `prepareNetwork`. */
export interface PrepareOptions {
  /** Loads subnetwork documents by reference; without it subnetwork blocks are a problem. */
  resolveSubnetwork?: SubnetworkResolver
  /** Loads data sets of `data` blocks by reference; without it data blocks are a problem. */
  resolveData?: DataResolver
  /** Join order: 'auto' (greedy, the default), 'document' or 'random' (with `seed`); for tests. */
  joinOrder?: JoinOrder
  seed?: number
  /**
   * Join orders kept from earlier prepares (subnetworks included): a network whose join
   * structure is unchanged reuses its order instead of searching again; S is bit-identical.
   */
  plans?: JoinPlanCache
}

/** A document checked, evaluated and compiled, ready to be solved at any frequencies. */
export interface PreparedNetwork {
  document: NetworkDocument
  ports: number
  impedances: number[]
  /** Blocks that take part in the solve (ports included). */
  blocks: number
  /** The document's sweep as evaluated; fields it does not give are absent. */
  sweep?: Partial<SweepSettings>
  compiled: CompiledNetwork
  /** Block models used outside their published ranges, naming the block; `above` (Hz) as in `ModelNote`. */
  notes: Array<Problem & { above?: number }>
}

/** Outcome of `prepareNetwork`: evaluated values are filled in even when other parts fail. */
export type PrepareResult =
  | { ok: true; network: PreparedNetwork; evaluated: Evaluated }
  | { ok: false; problems: Problem[]; evaluated: Evaluated }

const MAX_DEPTH = DOCUMENT_LIMITS.subnetworkDepth

/** Blocks still allowed in one prepare, subnetwork uses expanded: shared by a document and everything it nests. */
interface ExpansionBudget { remaining: number }

/**
 * Checks a network document against the contract, evaluates every expression, checks
 * the topology and compiles the join order. Never throws for a bad document: each
 * problem names the block, the field and the reason.
 */
export function prepareNetwork(input: unknown, options: PrepareOptions = {}): PrepareResult {
  return prepareAt(input, options, [], { remaining: DOCUMENT_LIMITS.expandedBlocks })
}

function prepareAt(input: unknown, options: PrepareOptions, trail: readonly string[], budget: ExpansionBudget): PrepareResult {
  const evaluated: Evaluated = { variables: {}, blocks: {}, settings: {} }
  const parsed = parseNetworkDocument(input)
  if (!parsed.ok) return { ok: false, problems: parsed.problems, evaluated }
  const document = parsed.document
  // Each use of a subnetwork counts its blocks again, so a chain of networks that each use the next several times stops here.
  budget.remaining -= document.blocks.length
  if (budget.remaining < 0) {
    const where = trail.length ? ` (reached inside ${trail.map(r => `"${r}"`).join(' → ')})` : ''
    return { ok: false, problems: [{ message: `the network with its subnetworks expanded has more than ${DOCUMENT_LIMITS.expandedBlocks.toLocaleString('en-GB')} blocks${where}` }], evaluated }
  }
  const problems: Problem[] = []

  const variables = evaluateVariables(document.variables)
  evaluated.variables = variables.evaluated
  problems.push(...variables.problems)

  const referenceImpedance = evaluateReference(document, variables, evaluated, problems)
  const sweep = evaluateSweep(document, variables, evaluated, problems)
  const substrates = evaluateSubstrates(document.substrates, variables.scope, variables.failed)
  Object.assign(evaluated.settings, substrates.evaluated)
  problems.push(...substrates.problems)
  const substrate = (name: string): SubstrateLookup => {
    const found = substrates.values.get(name)
    if (found) return { ok: true, substrate: found }
    if (substrates.failed.has(name)) return { ok: false, message: `substrate "${name}" has errors (see substrates.${name})` }
    const known = Object.keys(document.substrates ?? {})
    return { ok: false, message: known.length ? `"${name}" is not one of the document's substrates (${known.join(', ')})` : `"${name}" names no substrate: the document has none; add one under substrates` }
  }

  const context = (blockId: string): CreateContext => ({
    blockId,
    referenceImpedance,
    buildNetwork: (doc, label) => nested(prepareAt(doc, { ...options, joinOrder: 'auto' }, trail, budget), label),
    resolveNetwork: ref => resolve(ref, options, trail, budget),
    resolveData: ref => resolveDataSet(ref, options.resolveData, trail),
    substrate,
  })
  const notes: PreparedNetwork['notes'] = []

  const compileBlocks: CompileBlock[] = []
  const terminals = new Map<string, number>()
  const portIndex = new Map<string, number>()
  for (const block of document.blocks) {
    const model = BLOCK_MODELS[block.type]
    if (!model) {
      const message = LATER_BLOCK_TYPES.has(block.type)
        ? `block ${block.id}: type "${block.type}" is not available in this version of Portwright yet`
        : `block ${block.id}: unknown block type "${block.type}" (known types: ${Object.keys(BLOCK_MODELS).join(', ')})`
      problems.push({ block: block.id, field: 'type', message })
      continue
    }
    if (model.terminals !== undefined) terminals.set(block.id, model.terminals)
    const outcome = evaluateParams(block.id, block.type, block.params, model.params, { scope: variables.scope, failed: variables.failed, referenceImpedance })
    evaluated.blocks[block.id] = outcome.evaluated
    if (block.type === 'port' && typeof outcome.values.index === 'number') portIndex.set(block.id, outcome.values.index)
    if (outcome.problems.length) {
      problems.push(...outcome.problems)
      continue
    }
    const blockProblem = (field: string | undefined, message: string): void => {
      if (field) evaluated.blocks[block.id]![field] = { ...evaluated.blocks[block.id]![field], error: message }
      problems.push({ block: block.id, ...(field ? { field } : {}), message: `block ${block.id} (${block.type})${field ? `, ${field}` : ''}: ${message}` })
    }
    const checks = model.check?.(outcome.values) ?? []
    for (const check of checks) blockProblem(check.field, check.message)
    if (checks.length) continue
    const created = model.create(outcome.values as ParamValues, context(block.id))
    if (!created.ok) {
      for (const p of created.problems) blockProblem(p.field, p.message)
      continue
    }
    for (const note of created.notes ?? []) {
      notes.push({ block: block.id, ...(note.field ? { field: note.field } : {}), ...(note.above !== undefined ? { above: note.above } : {}), message: `block ${block.id} (${block.type})${note.field ? `, ${note.field}` : ''}: ${note.message}` })
    }
    terminals.set(block.id, created.instance.terminals)
    compileBlocks.push({ id: block.id, type: block.type, instance: created.instance })
  }

  problems.push(...checkTopology(document, { terminals: id => terminals.get(id), portIndex: id => portIndex.get(id) }))
  if (problems.length) return { ok: false, problems, evaluated }

  const compiled = new CompiledNetwork(compileBlocks, document.wires, { joinOrder: options.joinOrder, seed: options.seed, plans: options.plans })
  return {
    ok: true,
    evaluated,
    network: { document, ports: compiled.ports, impedances: compiled.impedances, blocks: compiled.blockCount, ...(sweep ? { sweep } : {}), compiled, notes },
  }
}

/** Evaluates `referenceImpedance` (default 50 Ω) for display and use; a bad one is a problem. */
function evaluateReference(document: NetworkDocument, variables: VariablesOutcome, evaluated: Evaluated, problems: Problem[]): number {
  let referenceImpedance = 50
  if (document.referenceImpedance !== undefined) {
    const outcome = evaluateQuantity(document.referenceImpedance, 'impedance', variables.scope, variables.failed)
    const error = !outcome.ok ? outcome.error : outcome.value > 0 ? undefined : `must be greater than zero (got ${formatQuantity(outcome.value, 'impedance')})`
    if (error) {
      evaluated.settings.referenceImpedance = { error }
      problems.push({ field: 'referenceImpedance', message: `referenceImpedance: ${error}` })
      return referenceImpedance
    }
    if (outcome.ok) referenceImpedance = outcome.value
  }
  evaluated.settings.referenceImpedance = { value: referenceImpedance, unit: 'Ω', display: formatQuantity(referenceImpedance, 'impedance') }
  return referenceImpedance
}

/** Evaluates the document's sweep, as far as it goes; the fields it lacks stay absent. */
function evaluateSweep(document: NetworkDocument, variables: VariablesOutcome, evaluated: Evaluated, problems: Problem[]): Partial<SweepSettings> | undefined {
  if (!document.sweep) return undefined
  const sweep: Partial<SweepSettings> = { points: document.sweep.points ?? 201, spacing: document.sweep.spacing ?? 'linear' }
  evaluated.settings['sweep.points'] = { value: sweep.points, display: String(sweep.points) }
  for (const field of ['start', 'stop'] as const) {
    const outcome = evaluateQuantity(document.sweep[field], 'frequency', variables.scope, variables.failed)
    const error = !outcome.ok ? outcome.error : outcome.value >= 0 ? undefined : `must not be negative (got ${formatQuantity(outcome.value, 'frequency')})`
    if (error) {
      evaluated.settings[`sweep.${field}`] = { error }
      problems.push({ field: `sweep.${field}`, message: `sweep.${field}: ${error}` })
    } else if (outcome.ok) {
      sweep[field] = outcome.value
      evaluated.settings[`sweep.${field}`] = { value: outcome.value, unit: 'Hz', display: formatQuantity(outcome.value, 'frequency') }
    }
  }
  return sweep
}

function nested(result: PrepareResult, label: string): NestedOutcome {
  if (result.ok) {
    const notes = result.network.notes.map(({ message, above }) => ({ message: `in ${label}: ${message}`, ...(above !== undefined ? { above } : {}) }))
    return { ok: true, network: result.network.compiled, notes }
  }
  return { ok: false, problems: result.problems.map(p => ({ message: `in ${label}: ${p.message}` })) }
}

function resolve(ref: string, options: PrepareOptions, trail: readonly string[], budget: ExpansionBudget): NestedOutcome {
  if (trail.includes(ref)) return { ok: false, problems: [{ message: `network "${ref}" contains itself: ${[...trail, ref].join(' → ')}` }] }
  if (trail.length >= MAX_DEPTH) return { ok: false, problems: [{ message: `subnetworks are nested more than ${MAX_DEPTH} deep at "${ref}"` }] }
  if (!options.resolveSubnetwork) return { ok: false, problems: [{ message: `network "${ref}" cannot be loaded here (no subnetwork loader was given)` }] }
  let document: unknown
  try {
    document = options.resolveSubnetwork(ref, trail)
  } catch (error) {
    return { ok: false, problems: [{ message: `network "${ref}" could not be loaded: ${(error as Error).message}` }] }
  }
  if (document === undefined || document === null) return { ok: false, problems: [{ message: `network "${ref}" was not found` }] }
  return nested(prepareAt(document, options, [...trail, ref], budget), `network "${ref}"`)
}

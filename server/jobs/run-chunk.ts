/**
 * Worker-thread entry: runs one chunk of a job (a range of Monte Carlo trials, or a whole optimisation) inside the
 * worker's time and memory budget, away from the queue's event loop. Pure computation: no database.
 */
import type { NetworkDocument } from '../../shared/network/types'
import type { JobParameters } from '../../shared/types/jobs'
import { textDataResolver } from '../../shared/touchstone/text-data-resolver'
import { applyValues, optimizeTunables, prepareTuning, resolveTolerances, resolveTunables, runTrials } from '../../shared/tuning/index'
import type { TuningSetup } from '../../shared/tuning/index'

export interface ChunkTask {
  parameters: JobParameters
  document: unknown
  /** The project's networks by id and name, for subnetwork blocks. */
  networks: Array<[string, unknown]>
  /** Touchstone texts of the data files the document and those networks name, by file name. */
  files?: Array<[string, string]>
  chunkIndex: number
}

/** What checking a run before it is queued needs: its kind, the document and the project's inputs. */
export interface JobCheckTask {
  kind: JobParameters['kind']
  document: unknown
  networks: Array<[string, unknown]>
  files?: Array<[string, string]>
}

export type ChunkOutcome =
  | { ok: true; trials: number; passed: number; unsolved: number; outcome: unknown }
  | { ok: false; problems: string[] }

/** The trial range [from, to) of chunk `index` of a tolerance run. */
export function chunkRange(parameters: { trials: number; chunkTrials: number }, index: number): { from: number; to: number } {
  const from = index * parameters.chunkTrials
  return { from, to: Math.min(parameters.trials, from + parameters.chunkTrials) }
}

const messages = (problems: Array<{ message: string }>) => problems.map(p => p.message)

/** The document prepared for tuning with subnetworks and data files from the task (files read here, in budget). */
function prepareJob(task: { document: unknown; networks: Array<[string, unknown]>; files?: Array<[string, string]> }): { ok: true; setup: TuningSetup } | { ok: false; problems: string[] } {
  const byRef = new Map(task.networks)
  const prepared = prepareTuning(task.document, { resolveSubnetwork: ref => byRef.get(ref), resolveData: textDataResolver(task.files ?? []) })
  return prepared.ok ? prepared : { ok: false, problems: messages(prepared.problems) }
}

/** Problems that would stop a run of this kind (none: it can be queued); the same preparation as every chunk. */
export function checkJob(task: JobCheckTask): string[] {
  const prepared = prepareJob(task)
  if (!prepared.ok) return prepared.problems
  const resolved = task.kind === 'tolerance' ? resolveTolerances(prepared.setup) : resolveTunables(prepared.setup)
  return resolved.ok ? [] : messages(resolved.problems)
}

export default function runChunk(task: ChunkTask): ChunkOutcome {
  const prepared = prepareJob(task)
  if (!prepared.ok) return prepared
  const p = task.parameters
  if (p.kind === 'tolerance') {
    const spreads = resolveTolerances(prepared.setup)
    if (!spreads.ok) return { ok: false, problems: messages(spreads.problems) }
    const { from, to } = chunkRange(p, task.chunkIndex)
    const run = runTrials(prepared.setup, spreads.spreads, { seed: p.seed, from, to })
    return { ok: true, trials: run.to - run.from, passed: run.passed, unsolved: run.unsolved, outcome: null }
  }
  const ranges = resolveTunables(prepared.setup)
  if (!ranges.ok) return { ok: false, problems: messages(ranges.problems) }
  const result = optimizeTunables(prepared.setup, ranges.ranges, { seed: p.seed, maxEvaluations: p.maxEvaluations })
  const document = applyValues(task.document as NetworkDocument, ranges.ranges.map(r => r.target), result.values)
  const values = ranges.ranges.map((r, i) => ({ key: r.target.key, value: result.values[i]! }))
  return { ok: true, trials: 0, passed: 0, unsolved: 0, outcome: { met: result.met, evaluations: result.evaluations, values, document } }
}


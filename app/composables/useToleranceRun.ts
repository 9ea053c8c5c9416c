/**
 * Runs a tolerance analysis in Web Workers, one per logical processor (at most 8), each on its own range
 * of trial indices; counts and traces are joined in index order, so the answer equals a single run's.
 * Progress is the sum of the workers'; cancel ends every worker at once. Workers that finished are kept
 * for the next run (and `warm` starts them ahead of the first), so a run does not wait for them to load.
 */
import { onBeforeUnmount, ref, shallowRef } from 'vue'
import type { NetworkDocument, Problem } from '~~/shared/network/types'
import type { TraceSpec } from '~~/shared/tuning/trace-values'
import type { ToleranceReply } from '~~/app/workers/tolerance-protocol'
import { splitTrials } from '~~/app/utils/tuning/splitTrials'

/** The joined outcome of a finished run. */
export interface ToleranceOutcome {
  trials: number
  passed: number
  unsolved: number
  seed: number
  frequencies: Float64Array
  /** Per trace, trial-major values over `frequencies` (see `runTrials`). */
  traces: Float64Array[]
}

const MAX_WORKERS = 8

export function useToleranceRun() {
  const running = ref(false)
  const done = ref(0)
  const total = ref(0)
  const outcome = shallowRef<ToleranceOutcome | null>(null)
  const problems = shallowRef<Problem[]>([])
  let workers: Worker[] = []
  /** Loaded workers waiting for a run. */
  let idle: Worker[] = []
  let runId = 0

  const poolSize = () => Math.min(globalThis.navigator?.hardwareConcurrency || 2, MAX_WORKERS)
  function spawn(): Worker {
    const w = new Worker(new URL('../workers/tolerance.worker.ts', import.meta.url), { type: 'module' })
    // A worker that fails while waiting is dropped; a run sets its own handler when it takes one.
    w.onerror = () => { idle = idle.filter(x => x !== w); w.terminate() }
    return w
  }

  /** Starts the workers a run will use, so they load (scripts, math library) before it begins. */
  function warm(count = poolSize()) {
    if (typeof Worker === 'undefined') return
    while (idle.length < count) idle.push(spawn())
  }

  function stopWorkers() {
    for (const w of workers) w.terminate()
    workers = []
  }

  /** A finished run's workers wait for the next one. */
  function releaseWorkers() {
    for (const w of workers) {
      w.onmessage = null
      w.onerror = () => { idle = idle.filter(x => x !== w); w.terminate() }
    }
    idle.push(...workers)
    workers = []
  }

  let settle: (outcome: ToleranceOutcome | null) => void = () => {}

  /**
   * Starts a run of `trials` designs with `seed` (only the `active` tolerances spread, when given); a run
   * already going is cancelled first. Resolves with the outcome, or null when cancelled or failed.
   */
  function start(document: NetworkDocument, options: { trials: number, seed: number, traces?: TraceSpec[], active?: string[] }): Promise<ToleranceOutcome | null> {
    cancel()
    const finishedRun = new Promise<ToleranceOutcome | null>((resolve) => { settle = resolve })
    const id = ++runId
    const parts = splitTrials(options.trials, poolSize())
    const progress = parts.map(() => 0)
    const finished: Array<Extract<ToleranceReply, { kind: 'done' }> | undefined> = parts.map(() => undefined)
    running.value = true
    done.value = 0
    total.value = options.trials
    problems.value = []
    const plain = JSON.parse(JSON.stringify(document)) as NetworkDocument
    warm(parts.length)
    const ready = idle.splice(0, parts.length)
    workers = parts.map((part, i) => {
      const w = ready[i]!
      w.onmessage = (event: MessageEvent<ToleranceReply>) => {
        const reply = event.data
        if (reply.runId !== id) return
        if (reply.kind === 'failed') {
          problems.value = reply.problems
          cancel()
          return
        }
        progress[i] = reply.kind === 'progress' ? reply.done : reply.to - reply.from
        done.value = progress.reduce((a, b) => a + b, 0)
        if (reply.kind === 'done') {
          finished[i] = reply
          if (finished.every(Boolean)) join(finished as Array<Extract<ToleranceReply, { kind: 'done' }>>, options)
        }
      }
      w.onerror = (event) => {
        problems.value = [{ message: `A tolerance worker stopped: ${event.message || 'unknown error'}` }]
        cancel()
      }
      w.postMessage({ runId: id, document: plain, seed: options.seed, from: part.from, to: part.to, traces: options.traces ?? [], ...(options.active ? { active: options.active } : {}) })
      return w
    })
    return finishedRun
  }

  function join(parts: Array<Extract<ToleranceReply, { kind: 'done' }>>, options: { trials: number, seed: number }) {
    const traceCount = parts[0]?.traces.length ?? 0
    const traces = Array.from({ length: traceCount }, (_, j) => {
      const out = new Float64Array(parts.reduce((n, p) => n + p.traces[j]!.length, 0))
      let at = 0
      for (const p of parts) { out.set(p.traces[j]!, at); at += p.traces[j]!.length }
      return out
    })
    outcome.value = {
      trials: options.trials,
      passed: parts.reduce((n, p) => n + p.passed, 0),
      unsolved: parts.reduce((n, p) => n + p.unsolved, 0),
      seed: options.seed,
      frequencies: parts[0]?.frequencies ?? new Float64Array(0),
      traces,
    }
    running.value = false
    releaseWorkers()
    settle(outcome.value)
    settle = () => {}
  }

  /** Ends the run now; nothing from it is shown. */
  function cancel() {
    runId++
    stopWorkers()
    running.value = false
    settle(null)
    settle = () => {}
  }

  onBeforeUnmount(() => {
    cancel()
    for (const w of idle) w.terminate()
    idle = []
  })
  return { start, cancel, warm, running, done, total, outcome, problems }
}

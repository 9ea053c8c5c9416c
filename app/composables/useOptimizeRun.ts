/**
 * Runs the optimiser in a Web Worker and hands back the values it found; Stop ends the worker.
 * The caller decides how to write them (the panel writes them all as one undo step).
 */
import { onBeforeUnmount, ref, shallowRef } from 'vue'
import type { NetworkDocument, Problem } from '~~/shared/network/types'
import type { OptimizeReply } from '~~/app/workers/optimize-protocol'

export function useOptimizeRun(onDone: (reply: Extract<OptimizeReply, { kind: 'done' }>) => void) {
  const running = ref(false)
  const outcome = shallowRef<{ met: boolean, evaluations: number } | null>(null)
  const problems = shallowRef<Problem[]>([])
  let worker: Worker | null = null
  let runId = 0

  function cancel() {
    runId++
    worker?.terminate()
    worker = null
    running.value = false
  }

  /** Starts the optimiser on this document; a run already going is stopped first. */
  function start(document: NetworkDocument, options: { seed: number, maxEvaluations: number }) {
    cancel()
    const id = ++runId
    running.value = true
    problems.value = []
    outcome.value = null
    worker = new Worker(new URL('../workers/optimize.worker.ts', import.meta.url), { type: 'module' })
    worker.onmessage = (event: MessageEvent<OptimizeReply>) => {
      const reply = event.data
      if (reply.runId !== id) return
      cancel()
      if (reply.kind === 'failed') { problems.value = reply.problems; return }
      outcome.value = { met: reply.met, evaluations: reply.evaluations }
      onDone(reply)
    }
    worker.onerror = (event) => {
      cancel()
      problems.value = [{ message: `The optimiser stopped: ${event.message || 'unknown error'}` }]
    }
    worker.postMessage({ runId: id, document: JSON.parse(JSON.stringify(document)) as NetworkDocument, seed: options.seed, maxEvaluations: options.maxEvaluations })
  }

  onBeforeUnmount(cancel)
  return { start, cancel, running, outcome, problems }
}

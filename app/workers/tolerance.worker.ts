/// <reference lib="webworker" />
// Runs one range of Monte Carlo trials off the main thread; the editor cancels a run by ending the worker.
import { prepareTuning, resolveTolerances, runTrials } from '../../shared/tuning'
import type { ToleranceReply, ToleranceRequest } from './tolerance-protocol'

// Progress is posted at most this often, so messages never outnumber the work.
const PROGRESS_MS = 100

function run(request: ToleranceRequest): { reply: ToleranceReply, transfer: Transferable[] } {
  const prepared = prepareTuning(request.document)
  if (!prepared.ok) return { reply: { runId: request.runId, kind: 'failed', problems: prepared.problems }, transfer: [] }
  const spreads = resolveTolerances(prepared.setup)
  if (!spreads.ok) return { reply: { runId: request.runId, kind: 'failed', problems: spreads.problems }, transfer: [] }
  let last = performance.now()
  const result = runTrials(prepared.setup, spreads.spreads, {
    seed: request.seed,
    from: request.from,
    to: request.to,
    traces: request.traces,
    ...(request.active ? { active: new Set(request.active) } : {}),
    onProgress: (done) => {
      const now = performance.now()
      if (now - last < PROGRESS_MS) return
      last = now
      self.postMessage({ runId: request.runId, kind: 'progress', done } satisfies ToleranceReply)
    },
  })
  const traces = result.traces.map(t => t.slice())
  return {
    reply: { runId: request.runId, kind: 'done', from: result.from, to: result.to, passed: result.passed, unsolved: result.unsolved, frequencies: result.frequencies.slice(), traces },
    transfer: traces.map(t => t.buffer),
  }
}

self.onmessage = (event: MessageEvent<ToleranceRequest>) => {
  try {
    const { reply, transfer } = run(event.data)
    self.postMessage(reply, transfer)
  }
  catch (error) {
    const message = error instanceof Error ? error.message : String(error)
    self.postMessage({ runId: event.data.runId, kind: 'failed', problems: [{ message: `The tolerance run failed: ${message}` }] } satisfies ToleranceReply)
  }
}

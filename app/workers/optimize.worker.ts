/// <reference lib="webworker" />
// Runs the optimiser off the main thread; the editor writes the values it finds into the document as one step.
import { optimizeTunables, prepareTuning, resolveTunables } from '../../shared/tuning'
import type { OptimizeReply, OptimizeRequest, TunedValue } from './optimize-protocol'

function run(request: OptimizeRequest): OptimizeReply {
  const prepared = prepareTuning(request.document)
  if (!prepared.ok) return { runId: request.runId, kind: 'failed', problems: prepared.problems }
  const ranges = resolveTunables(prepared.setup)
  if (!ranges.ok) return { runId: request.runId, kind: 'failed', problems: ranges.problems }
  const result = optimizeTunables(prepared.setup, ranges.ranges, { seed: request.seed, maxEvaluations: request.maxEvaluations })
  const values: TunedValue[] = ranges.ranges.map(({ target }, i) => {
    const value = result.values[i]!
    if ('variable' in target.where) {
      const unit = 'variableUnit' in target.unit ? target.unit.variableUnit : null
      return { key: target.key, variable: target.where.variable, value: unit ? `${value} ${unit}` : value }
    }
    return { key: target.key, block: prepared.setup.document.blocks[target.where.block]!.id, param: target.where.param, value }
  })
  return { runId: request.runId, kind: 'done', met: result.met, evaluations: result.evaluations, values }
}

self.onmessage = (event: MessageEvent<OptimizeRequest>) => {
  try {
    self.postMessage(run(event.data))
  }
  catch (error) {
    const message = error instanceof Error ? error.message : String(error)
    self.postMessage({ runId: event.data.runId, kind: 'failed', problems: [{ message: `The optimiser failed: ${message}` }] } satisfies OptimizeReply)
  }
}

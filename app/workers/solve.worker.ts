/// <reference lib="webworker" />
// Solves documents off the main thread so the canvas never waits for the sweep.
import { EditSolver, JoinPlanCache, prepareNetwork, resolveSweep, sweepFrequencies } from '../../shared/solver'
import type { DataSet } from '../../shared/solver/types'
import type { SolveReply, SolveRequest } from './protocol'

// Edits mostly change parameter values, not the join structure, so the join-order search is kept across requests.
const plans = new JoinPlanCache()
// A slider drag edits one block again and again: only that block's joins are redone (the rest is kept per frequency).
const edits = new EditSolver({ plans })
// Data sets of data blocks, by file name, as the editor sent them.
const dataSets = new Map<string, DataSet>()
// Documents of sub-networks by name, as the editor loaded them from the project.
let networks = new Map<string, unknown>()

function solve(request: SolveRequest): { reply: SolveReply, transfer: Transferable[] } {
  const t0 = performance.now()
  // New data sets or sub-network documents change blocks whose parameters stay the same: nothing kept may be reused.
  if (request.dataSets || request.networks) edits.reset()
  for (const [name, data] of Object.entries(request.dataSets ?? {})) dataSets.set(name, data)
  if (request.networks) networks = new Map(Object.entries(request.networks))
  const prepared = prepareNetwork(request.document, { plans, resolveData: name => dataSets.get(name), resolveSubnetwork: ref => networks.get(ref) })
  const base = { seq: request.seq, evaluated: prepared.evaluated ?? null }
  if (!prepared.ok) return { reply: { ...base, problems: prepared.problems, result: null, solveMs: performance.now() - t0 }, transfer: [] }
  const sweep = resolveSweep(prepared.network.sweep)
  if (!sweep.ok) return { reply: { ...base, problems: sweep.problems, result: null, solveMs: performance.now() - t0 }, transfer: [] }
  const frequencies = sweepFrequencies(sweep.sweep)
  const solved = edits.solve(prepared.network, prepared.evaluated, frequencies)
  if (!solved.ok) return { reply: { ...base, problems: solved.problems, result: null, solveMs: performance.now() - t0 }, transfer: [] }
  const r = solved.result
  const result = { ports: r.ports, impedances: [...r.impedances], frequencies: r.frequencies, re: r.re, im: r.im }
  return {
    reply: { ...base, problems: solved.warnings, result, solveMs: performance.now() - t0 },
    transfer: [r.frequencies.buffer, r.re.buffer, r.im.buffer],
  }
}

self.onmessage = (event: MessageEvent<SolveRequest>) => {
  try {
    const { reply, transfer } = solve(event.data)
    self.postMessage(reply, transfer)
  }
  catch (error) {
    const message = error instanceof Error ? error.message : String(error)
    const reply: SolveReply = { seq: event.data.seq, evaluated: null, problems: [{ message: `The solver failed: ${message}` }], result: null, solveMs: 0 }
    self.postMessage(reply)
  }
}

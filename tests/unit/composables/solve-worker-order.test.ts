// The editor shows a new result before the values and problems that came with it (they re-render the
// inspector and the canvas labels), and shows problems at once when there is no result to draw.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest'
import type { Evaluated, NetworkDocument } from '../../../shared/network/types'
import type { SolveReply, SolveRequest, SolvedData } from '../../../app/workers/protocol'
import { useSolveWorker } from '../../../app/composables/useSolveWorker'

// Used outside a component here: there is nothing to unmount.
vi.mock('vue', async importOriginal => ({ ...(await importOriginal<typeof import('vue')>()), onBeforeUnmount: () => {} }))

/** Stands in for the solve worker: keeps what it was sent; the test answers. */
class FakeWorker {
  static last: FakeWorker | null = null
  sent: SolveRequest[] = []
  onmessage: ((event: { data: SolveReply }) => void) | null = null
  onerror: unknown = null
  constructor() { FakeWorker.last = this }
  postMessage(message: SolveRequest) { this.sent.push(message) }
  terminate() {}
  answer(reply: Omit<SolveReply, 'seq'>) { this.onmessage!({ data: { ...reply, seq: this.sent.at(-1)!.seq } }) }
}

const realWorker = (globalThis as { Worker?: unknown }).Worker
beforeAll(() => { (globalThis as { Worker?: unknown }).Worker = FakeWorker })
afterAll(() => { (globalThis as { Worker?: unknown }).Worker = realWorker })

const doc = (name: string) => ({ format: 'portwright.network', version: 1, name, blocks: [], wires: [] }) as unknown as NetworkDocument
const evaluated = (z: number): Evaluated => ({ variables: {}, blocks: { TL1: { impedance: { value: z, display: `${z} Ω` } } }, settings: {} })
const result = (): SolvedData => ({ ports: 1, impedances: [50], frequencies: Float64Array.of(1e9), re: Float64Array.of(0.1), im: Float64Array.of(0) })
const nextTask = () => new Promise(resolve => setTimeout(resolve, 0))

describe('order in which a solve reply is shown', () => {
  it('shows the result at once and its values and problems one task later', async () => {
    const solver = useSolveWorker()
    solver.request(doc('a'))
    const worker = FakeWorker.last!
    const shown = result()
    worker.answer({ evaluated: evaluated(40), problems: [{ block: 'TL1', message: 'outside its range' }], result: shown, solveMs: 1 })
    expect(solver.result.value).toBe(shown)
    expect(solver.stale.value).toBe(false)
    expect(solver.evaluated.value).toBeNull()
    expect(solver.problems.value).toEqual([])
    await nextTask()
    expect(solver.evaluated.value?.blocks.TL1?.impedance?.value).toBe(40)
    expect(solver.problems.value).toEqual([{ block: 'TL1', message: 'outside its range' }])
  })

  it('shows only the newest values when two results arrive within one task', async () => {
    const solver = useSolveWorker()
    solver.request(doc('a'))
    const worker = FakeWorker.last!
    worker.answer({ evaluated: evaluated(40), problems: [], result: result(), solveMs: 1 })
    solver.request(doc('b'))
    worker.answer({ evaluated: evaluated(45), problems: [], result: result(), solveMs: 1 })
    await nextTask()
    expect(solver.evaluated.value?.blocks.TL1?.impedance?.value).toBe(45)
  })

  it('shows problems at once when a reply has no result, and keeps the last result as stale', async () => {
    const solver = useSolveWorker()
    solver.request(doc('a'))
    const worker = FakeWorker.last!
    const shown = result()
    worker.answer({ evaluated: evaluated(40), problems: [], result: shown, solveMs: 1 })
    solver.request(doc('b'))
    worker.answer({ evaluated: evaluated(0), problems: [{ block: 'TL1', field: 'impedance', message: 'must be greater than zero' }], result: null, solveMs: 1 })
    expect(solver.problems.value).toEqual([{ block: 'TL1', field: 'impedance', message: 'must be greater than zero' }])
    expect(solver.evaluated.value?.blocks.TL1?.impedance?.value).toBe(0)
    expect(solver.result.value).toBe(shown)
    expect(solver.stale.value).toBe(true)
    // The values of the earlier result, still pending, must not overwrite these.
    await nextTask()
    expect(solver.evaluated.value?.blocks.TL1?.impedance?.value).toBe(0)
  })

  it('says a solve is slow only after it has run for a while, and not once it has answered', async () => {
    const solver = useSolveWorker()
    solver.request(doc('a'))
    const worker = FakeWorker.last!
    expect(solver.busy.value).toBe(true)
    await new Promise(resolve => setTimeout(resolve, 20))
    expect(solver.slow.value).toBe(false)
    await new Promise(resolve => setTimeout(resolve, 250))
    expect(solver.slow.value).toBe(true)
    worker.answer({ evaluated: evaluated(40), problems: [], result: result(), solveMs: 1 })
    await nextTask()
    expect(solver.slow.value).toBe(false)
    expect(solver.busy.value).toBe(false)
  })
})

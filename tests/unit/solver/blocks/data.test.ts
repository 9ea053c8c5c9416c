// The `data` block: a Touchstone data set used as a block, interpolated in frequency.
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { cliPrepareOptions } from '../../../../scripts/network-cli'
import { branchLineHybrid } from '../../../../shared/examples/index'
import { prepareNetwork, solveDocument, solveNetwork, type DataSet } from '../../../../shared/solver/index'
import { TouchstoneError } from '../../../../shared/touchstone/error'
import { writeTouchstone } from '../../../../shared/touchstone/write'
import { doc, matrix, maxDiff, port, s, solveAt, type C } from '../helpers'

const dataBlock = (file: string, id = 'D') => ({ id, type: 'data', params: { file } })
const twoPort = (file = 'dut.s2p') => doc([port(1), port(2), dataBlock(file)], [['P1.1', 'D.1'], ['D.2', 'P2.1']])
const close = (a: C, b: C, tolerance = 1e-12) => expect(Math.hypot(a[0] - b[0], a[1] - b[1])).toBeLessThan(tolerance)

/** A matched delay of τ seconds sampled at the given frequencies: S21 = S12 = e^{−j2πfτ}. */
function delay(frequencies: number[], tau: number, impedances = [50, 50]): DataSet {
  const re = new Float64Array(frequencies.length * 4), im = new Float64Array(frequencies.length * 4)
  frequencies.forEach((f, k) => {
    const phase = -2 * Math.PI * f * tau
    for (const e of [1, 2]) { re[k * 4 + e] = Math.cos(phase); im[k * 4 + e] = Math.sin(phase) }
  })
  return { ports: 2, impedances, frequencies: Float64Array.from(frequencies), re, im }
}

describe('data block: interpolation in frequency', () => {
  it('is exact at the file\'s frequencies', () => {
    const data = delay([1e9, 2e9, 3e9], 0.1e-9)
    const result = solveAt(twoPort(), [1e9, 2e9, 3e9], { resolveData: () => data })
    for (let k = 0; k < 3; k++) close(s(result, 2, 1, k), [data.re[k * 4 + 2]!, data.im[k * 4 + 2]!])
  })

  it('is linear in real and imaginary parts: at a midpoint, the chord of the unit circle', () => {
    // Derived by hand: the mean of e^{jθ1} and e^{jθ2} is cos((θ2 − θ1)/2)·e^{j(θ1 + θ2)/2}.
    const tau = 0.1e-9
    const data = delay([1e9, 2e9], tau)
    const result = solveAt(twoPort(), [1.5e9, 1.25e9], { resolveData: () => data })
    const half = (2 * Math.PI * 1e9 * tau) / 2
    const mid = -2 * Math.PI * 1.5e9 * tau
    close(s(result, 2, 1, 0), [Math.cos(half) * Math.cos(mid), Math.cos(half) * Math.sin(mid)])
    // A quarter of the way: (3/4)·e^{jθ1} + (1/4)·e^{jθ2}.
    const t1 = -2 * Math.PI * 1e9 * tau, t2 = -2 * Math.PI * 2e9 * tau
    close(s(result, 2, 1, 1), [0.75 * Math.cos(t1) + 0.25 * Math.cos(t2), 0.75 * Math.sin(t1) + 0.25 * Math.sin(t2)])
  })

  it('a solved network used as data gives the network\'s S at its frequencies', () => {
    const frequencies = [2.2e9, 2.3e9, 2.45e9, 2.6e9]
    const solved = solveDocument(branchLineHybrid, { sweep: { start: 2.2e9, stop: 2.6e9, points: 5 } })
    if (!solved.ok) throw new Error('example did not solve')
    const data: DataSet = solved.result
    const outer = doc([port(1), port(2), port(3), port(4), dataBlock('hybrid.s4p')], [['P1.1', 'D.1'], ['P2.1', 'D.2'], ['P3.1', 'D.3'], ['P4.1', 'D.4']])
    const direct = solveAt(outer, Array.from(solved.result.frequencies), { resolveData: () => data })
    for (let k = 0; k < 5; k++) {
      const at = Array.from({ length: 4 }, (_, i) => Array.from({ length: 4 }, (_, j): C => [data.re[(k * 4 + i) * 4 + j]!, data.im[(k * 4 + i) * 4 + j]!]))
      expect(maxDiff(matrix(direct, k), at)).toBeLessThan(1e-12)
    }
    expect(frequencies.length).toBe(4)
  })
})

describe('data block: ports and references from the file', () => {
  it('terminals are the file\'s ports; their references are the file\'s reference impedances', () => {
    // A one-port with S11 = 0 referred to 75 Ω is a 75 Ω load; at a 50 Ω port Γ = (75 − 50)/(75 + 50) = 0.2 (common practice).
    const load: DataSet = { ports: 1, impedances: [75], frequencies: Float64Array.of(1e9, 2e9), re: Float64Array.of(0, 0), im: Float64Array.of(0, 0) }
    const result = solveAt(doc([port(1), dataBlock('load.s1p')], [['P1.1', 'D.1']]), [1.5e9], { resolveData: () => load })
    close(s(result, 1, 1), [0.2, 0])
  })

  it('a wire to a terminal the file does not have is a problem', () => {
    const prepared = prepareNetwork(doc([port(1), port(2), dataBlock('x')], [['P1.1', 'D.1'], ['D.3', 'P2.1']]), { resolveData: () => delay([1e9], 0) })
    expect(prepared.ok).toBe(false)
    if (!prepared.ok) expect(prepared.problems.map(p => p.message).join('\n')).toMatch(/D\.3/)
  })
})

describe('data block: problems', () => {
  it('outside the file\'s range: an error naming the block and the range with SI prefixes', () => {
    const prepared = prepareNetwork(twoPort(), { resolveData: () => delay([1e9, 2e9, 3e9], 0) })
    if (!prepared.ok) throw new Error('did not prepare')
    const solved = solveNetwork(prepared.network, Float64Array.of(2e9, 3.5e9))
    expect(solved.ok).toBe(false)
    if (!solved.ok) {
      expect(solved.problems[0]!.message).toBe('block D (data), file "dut.s2p": 3.5 GHz is outside the file\'s range (1 GHz to 3 GHz); narrow the sweep or use a file that covers it')
      expect(solved.problems[0]!.block).toBe('D')
    }
  })

  it('just outside the range prints enough digits to tell the frequency from the edge', () => {
    const prepared = prepareNetwork(twoPort(), { resolveData: () => delay([1e9, 3e9], 0) })
    if (!prepared.ok) throw new Error('did not prepare')
    const solved = solveNetwork(prepared.network, Float64Array.of(999.99e6))
    if (!solved.ok) expect(solved.problems[0]!.message).toMatch(/999\.99 MHz is outside the file's range \(1 GHz to 3 GHz\)/)
    expect(solved.ok).toBe(false)
  })

  it('no loader, a file that cannot be read, a missing file and a malformed data set are problems naming the block and field', () => {
    const messages = (options: Parameters<typeof prepareNetwork>[1]) => {
      const prepared = prepareNetwork(twoPort(), options)
      return prepared.ok ? [] : prepared.problems.map(p => p.message)
    }
    expect(messages({})).toEqual(['block D (data), file: data set "dut.s2p" cannot be loaded here (no data loader was given)'])
    expect(messages({ resolveData: () => { throw new TouchstoneError(7, '[End] is missing') } })).toEqual(['block D (data), file: data set "dut.s2p" could not be read: line 7: [End] is missing'])
    expect(messages({ resolveData: () => undefined })).toEqual(['block D (data), file: data set "dut.s2p" was not found'])
    const bad = { ...delay([1e9, 2e9], 0), impedances: [50, -1] }
    expect(messages({ resolveData: () => bad })).toEqual(['block D (data), file: data set "dut.s2p" needs one positive reference impedance per port'])
    const nan = delay([1e9, 2e9], 0)
    nan.re[3] = Number.NaN
    expect(messages({ resolveData: () => nan })).toEqual(['block D (data), file: data set "dut.s2p" has a value that is not a finite number'])
  })
})

describe('data block on the command line: paths relative to the document\'s folder', () => {
  it('reads the file beside the document, and beside a subnetwork in another folder', () => {
    const folder = mkdtempSync(join(tmpdir(), 'portwright-data-'))
    mkdirSync(join(folder, 'parts'))
    const data = delay([1e9, 2e9], 0.05e-9)
    writeFileSync(join(folder, 'dut.s2p'), writeTouchstone(data))
    writeFileSync(join(folder, 'parts', 'dut.s2p'), writeTouchstone({ ...data, impedances: [75, 75] }))
    writeFileSync(join(folder, 'parts', 'inner.json'), JSON.stringify(twoPort('dut.s2p')))
    const top = join(folder, 'top.json')
    writeFileSync(top, JSON.stringify(twoPort()))
    const direct = solveAt(twoPort(), [1.5e9], cliPrepareOptions(top))
    close(s(direct, 2, 1), [(Math.cos(-2 * Math.PI * 1e9 * 0.05e-9) + Math.cos(-2 * Math.PI * 2e9 * 0.05e-9)) / 2, (Math.sin(-2 * Math.PI * 1e9 * 0.05e-9) + Math.sin(-2 * Math.PI * 2e9 * 0.05e-9)) / 2])
    const nested = doc([port(1), port(2), { id: 'N', type: 'subnetwork', params: { network: 'parts/inner.json' } }], [['P1.1', 'N.1'], ['N.2', 'P2.1']])
    writeFileSync(top, JSON.stringify(nested))
    const prepared = prepareNetwork(nested, cliPrepareOptions(top))
    if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
    // The subnetwork's ports are 50 Ω, its file's 75 Ω: it read parts/dut.s2p, not the top folder's.
    const inner = prepareNetwork(twoPort('parts/dut.s2p'), cliPrepareOptions(top))
    if (!inner.ok) throw new Error('inner did not prepare')
    const a = solveNetwork(prepared.network, Float64Array.of(1.2e9)), b = solveNetwork(inner.network, Float64Array.of(1.2e9))
    if (!a.ok || !b.ok) throw new Error('did not solve')
    expect(maxDiff(matrix(a.result), matrix(b.result))).toBeLessThan(1e-12)
    expect(Math.hypot(...s(a.result, 1, 1))).toBeGreaterThan(0.1)
  })

  it('a malformed file is a problem with its line', () => {
    const folder = mkdtempSync(join(tmpdir(), 'portwright-data-'))
    writeFileSync(join(folder, 'dut.s2p'), '# GHZ S RI R 50\n2 0 0 0 0 0 0 0 0\n1 0 0 0 0 0 0 0 0\n')
    const prepared = prepareNetwork(twoPort(), cliPrepareOptions(join(folder, 'top.json')))
    expect(prepared.ok).toBe(false)
    if (!prepared.ok) expect(prepared.problems[0]!.message).toBe('block D (data), file: data set "dut.s2p" could not be read: line 3: the frequency 1 GHz is not above the one before it (2 GHz); frequencies must increase')
  })
})

import { describe, expect, it } from 'vitest'
import { branchLineHybrid } from '../../../shared/examples/index'
import { solveDocument } from '../../../shared/solver/index'
import { readTouchstone } from '../../../shared/touchstone/read'
import { SAFETY_NOTE } from '../../../shared/solver/safety-note'
import { defaultTouchstoneChoice, touchstoneChoiceProblem, touchstoneFileName, touchstoneText, type TouchstoneChoice } from '../../../app/utils/results/touchstoneExport'
import type { SolvedData } from '../../../app/workers/protocol'

function solvedBranchLine(): SolvedData {
  const solved = solveDocument(branchLineHybrid)
  if (!solved.ok) throw new Error('the branch-line example must solve')
  const r = solved.result
  return { ports: r.ports, impedances: [...r.impedances], frequencies: r.frequencies, re: r.re, im: r.im }
}
const when = new Date('2026-01-02T03:04:05Z')

/** Largest |difference| of S(ports[i], ports[j]) between the solve and a file read back (RI, or polar for MA/DB). */
function worstDifference(result: SolvedData, ports: number[], text: string): number {
  const back = readTouchstone(text)
  const n = result.ports, m = ports.length
  let worst = 0
  for (let k = 0; k < result.frequencies.length; k++) {
    worst = Math.max(worst, Math.abs(back.frequencies[k]! - result.frequencies[k]!) / result.frequencies[k]!)
    for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) {
      const from = (k * n + ports[i]! - 1) * n + ports[j]! - 1
      const to = (k * m + i) * m + j
      worst = Math.max(worst, Math.abs(back.re[to]! - result.re[from]!), Math.abs(back.im[to]! - result.im[from]!))
    }
  }
  return worst
}

describe('Touchstone export of a solve (Touchstone File Format Specification 2.0, IBIS Open Forum)', () => {
  const result = solvedBranchLine()
  const all = defaultTouchstoneChoice(result)

  it('the first choice is version 1.1 with every port, RI and GHz for ports sharing one impedance', () => {
    expect(all).toEqual({ version: '1.1', ports: [1, 2, 3, 4], format: 'RI', unit: 'GHZ' })
    expect(touchstoneFileName('branch-line', 4)).toBe('branch-line.s4p')
  })

  for (const version of ['1.1', '2.0'] as const) {
    for (const format of ['RI', 'MA', 'DB'] as const) {
      for (const unit of ['HZ', 'KHZ', 'MHZ', 'GHZ'] as const) {
        it(`reads back equal to the solve within 1e-12: version ${version}, ${format}, ${unit}`, () => {
          const choice: TouchstoneChoice = { version, ports: [1, 2, 3, 4], format, unit }
          const text = touchstoneText(result, choice, { name: 'Branch-line', when })
          // RI keeps every digit; MA and DB go through polar form and back, which costs a few ulps.
          expect(worstDifference(result, choice.ports, text)).toBeLessThan(1e-12)
          expect(text).toContain(`# ${unit} S ${format} R 50`)
          if (version === '2.0') expect(text).toContain('[Version] 2.0')
          else expect(text).not.toContain('[Version]')
        })
      }
    }
  }

  it('a chosen subset of ports is written as a smaller network, in the order chosen', () => {
    const ports = [3, 1]
    const text = touchstoneText(result, { ...all, ports, version: '2.0' }, { name: 'Branch-line', when })
    expect(text).toContain('[Number of Ports] 2')
    expect(worstDifference(result, ports, text)).toBeLessThan(1e-12)
  })

  it('carries the name, the time and the simulated-results caution as comments', () => {
    const text = touchstoneText(result, all, { name: 'Branch-line', when })
    const comments = text.split('\n').filter(l => l.startsWith('!'))
    expect(comments[0]).toBe('! Branch-line: S-parameters exported from Portwright on 2026-01-02T03:04:05.000Z')
    expect(comments).toContain(`! ${SAFETY_NOTE}`)
  })

  it('refuses version 1.1 for ports of unequal reference impedance, and an empty port choice', () => {
    const mixed = { ...result, impedances: [50, 50, 75, 50] }
    expect(touchstoneChoiceProblem(mixed, { ...all, ports: [1, 3] })).toMatch(/choose version 2\.0/)
    expect(touchstoneChoiceProblem(mixed, { ...all, ports: [1, 2] })).toBeNull()
    expect(touchstoneChoiceProblem(mixed, { ...all, ports: [1, 3], version: '2.0' })).toBeNull()
    expect(() => touchstoneText(mixed, { ...all, ports: [1, 3] }, { name: 'x', when })).toThrow(RangeError)
    expect(touchstoneChoiceProblem(result, { ...all, ports: [] })).toMatch(/at least one port/)
    expect(touchstoneChoiceProblem(result, { ...all, ports: [5] })).toMatch(/1 to 4/)
    expect(defaultTouchstoneChoice(mixed).version).toBe('2.0')
  })
})

import { describe, expect, it } from 'vitest'
import { branchLineHybrid } from '../../../shared/examples/index'
import { snapshotSummary } from '../../../shared/review/snapshot-summary'
import type { NetworkDocument } from '../../../shared/network/types'
import { reportBalancePair } from '../../../app/utils/report/balancePair'
import { blockRows, specConditionLines, variableRows } from '../../../app/utils/report/reportTables'
import { schematic } from '../../../app/utils/report/schematic'
import { dataFileNames, solveForReport } from '../../../app/utils/report/solveForReport'

const doc = branchLineHybrid as NetworkDocument

describe('the printable report', () => {
  it('solves the branch-line hybrid: at its centre the outputs are 3 dB down and 90° apart (Pozar, Microwave Engineering, 4th ed., §7.5)', () => {
    const solved = solveForReport(doc)
    expect(solved.problems).toEqual([])
    expect(solved.result?.ports).toBe(4)
    const summary = snapshotSummary(doc)
    const pair = reportBalancePair(doc, summary)
    expect(pair?.a).toMatch(/^S\d1$/)
    expect(Math.abs(pair!.targetDeg)).toBe(90)
    // |S21| = |S31| = 1/√2 at the centre: 20·log10(1/√2) = −3.0103 dB (derived by hand).
    for (const t of summary.transfer!.filter(t => t.to === 2 || t.to === 3)) expect(Math.abs(t.db! + 3.0103)).toBeLessThan(0.05)
    expect(Math.abs(summary.balance!.imbalanceDb)).toBeLessThan(0.05)
  })

  it('names the files its data blocks read, once each, and reports a missing one as a problem', () => {
    const d: NetworkDocument = {
      format: 'portwright.network', version: 1, sweep: { start: 1e9, stop: 2e9, points: 3 },
      blocks: [
        { id: 'P1', type: 'port', params: { index: 1 } },
        { id: 'D1', type: 'data', params: { file: 'amp.s2p' } }, { id: 'D2', type: 'data', params: { file: 'amp.s2p' } },
      ],
      wires: [['P1.1', 'D1.1'], ['D1.2', 'D2.1']],
    }
    expect(dataFileNames(d)).toEqual(['amp.s2p'])
    const solved = solveForReport(d, { resolveData: () => undefined })
    expect(solved.result).toBeNull()
    expect(solved.problems.map(p => p.block)).toEqual(['D1', 'D2'])
    expect(solved.problems[0]!.message).toMatch(/"amp\.s2p" was not found/)
  })

  it('places every block and wire of the canvas inside one box', () => {
    const s = schematic(doc)
    expect(s.blocks).toHaveLength(doc.blocks.length)
    expect(s.wires).toHaveLength(doc.wires.length)
    for (const [a, b] of s.wires) {
      for (const p of [a, b]) {
        expect(p.x).toBeGreaterThan(s.box.x)
        expect(p.x).toBeLessThan(s.box.x + s.box.width)
        expect(p.y).toBeGreaterThan(s.box.y)
        expect(p.y).toBeLessThan(s.box.y + s.box.height)
      }
    }
  })

  it('leaves out a wire to a block that does not exist rather than failing', () => {
    const broken: NetworkDocument = { ...doc, wires: [...doc.wires, ['NOPE.1', doc.wires[0]![0]]] }
    expect(schematic(broken).wires).toHaveLength(doc.wires.length)
  })

  it('lists parameters as written, expressions with their value, variables and the spec in words', () => {
    const d: NetworkDocument = {
      format: 'portwright.network', version: 1.1, variables: { f0: '2.45 GHz', z: 'nope +' },
      blocks: [{ id: 'TL1', type: 'line', params: { impedance: 50, degrees: 90, at: 'f0' } }], wires: [],
      spec: { center: 'f0', conditions: [{ measure: 'returnLoss', port: 1, min: 20 }] },
    }
    const solved = solveForReport(d)
    const rows = blockRows(d, solved.evaluated)
    expect(rows[0]!.id).toBe('TL1')
    expect(rows[0]!.params.some(p => p.startsWith('at = f0 → 2.45'))).toBe(true)
    const vars = variableRows(d, solved.evaluated)
    expect(vars.find(v => v.name === 'f0')?.value).toMatch(/2\.45/)
    expect(vars.find(v => v.name === 'z')?.value).toMatch(/^does not evaluate/)
    expect(specConditionLines(d)).toEqual(['return loss at port 1 ≥ 20 dB'])
  })
})

import { describe, expect, it } from 'vitest'
import { solveDocument } from '../../../shared/solver/index'
import { findTemplate, templateDataResolver } from '../../../shared/templates/index'
import { INVENTED_AMPLIFIER_FILE, inventedAmplifier, inventedAmplifierText } from '../../../shared/templates/invented-amplifier'
import { demoTouchstoneFiles } from '../../../server/database/seeders/demo-touchstone'
import type { SolveResult } from '../../../shared/solver/index'

const template = findTemplate('balanced-amplifier')!
const resolveData = templateDataResolver(template)

/** |S(i+1)(j+1)| at frequency index k. */
function magnitude(result: SolveResult, k: number, i: number, j: number): number {
  const at = (k * result.ports + i) * result.ports + j
  return Math.hypot(result.re[at]!, result.im[at]!)
}

/** Linear interpolation of |S| of the amplifier file (two-port) at frequency f, on its own grid. */
function amplifierAt(f: number, i: number, j: number): number {
  const data = inventedAmplifier()
  const k = data.frequencies.findIndex(x => x >= f)
  const at = (k * 2 + i) * 2 + j
  return Math.hypot(data.re[at]!, data.im[at]!)
}

describe('balanced-amplifier template', () => {
  const document = template.build()

  it('names the demo amplifier file and carries the very text the demo project holds', () => {
    expect(template.files?.map(f => f.name)).toEqual([INVENTED_AMPLIFIER_FILE])
    const dataBlocks = document.blocks.filter(b => b.type === 'data')
    expect(dataBlocks.map(b => b.params.file)).toEqual([INVENTED_AMPLIFIER_FILE, INVENTED_AMPLIFIER_FILE])
    // Same bytes as the seeded demo file, so a project that has it is recognised as having it.
    expect(demoTouchstoneFiles().find(f => f.name === INVENTED_AMPLIFIER_FILE)?.text).toBe(inventedAmplifierText())
  })

  it('cannot be solved without its data file', () => {
    const solved = solveDocument(document)
    expect(solved.ok).toBe(false)
  })

  it('at the centre: input and output matched, gain of one stage', () => {
    // Balanced stage between ideal equal-split quadrature hybrids: the input reflection is
    // ½(Γa − Γb), zero for two equal stages, and |S21| equals one stage's |S21| (Kurokawa, "Design
    // theory of balanced transistor amplifiers", Bell System Technical Journal 44(8), 1965 [memory]).
    // The branch-line hybrids are exact equal-split quadrature hybrids at f0, their design frequency.
    const solved = solveDocument(document, { sweep: { start: 2.45e9, stop: 2.45e9, points: 1 }, resolveData })
    if (!solved.ok) throw new Error(solved.problems.map(p => p.message).join('\n'))
    expect(magnitude(solved.result, 0, 0, 0)).toBeLessThan(1e-6)
    expect(magnitude(solved.result, 0, 1, 1)).toBeLessThan(1e-6)
    // 2.45 GHz is a sample of the file (2.0 GHz + 45 × 10 MHz): |S21| = 10^(15/20) there.
    expect(magnitude(solved.result, 0, 1, 0)).toBeCloseTo(amplifierAt(2.45e9, 1, 0), 9)
    expect(magnitude(solved.result, 0, 1, 0)).toBeCloseTo(10 ** (15 / 20), 6)
  })

  it('over its band: return loss of the pair at least 14 dB better than one stage alone', () => {
    const solved = solveDocument(document, { sweep: { start: 2.35e9, stop: 2.55e9, points: 21 }, resolveData })
    if (!solved.ok) throw new Error(solved.problems.map(p => p.message).join('\n'))
    for (let k = 0; k < solved.result.frequencies.length; k++) {
      const f = solved.result.frequencies[k]!
      const pairDb = -20 * Math.log10(magnitude(solved.result, k, 0, 0))
      const stageDb = -20 * Math.log10(amplifierAt(f, 0, 0))
      expect(stageDb, `${f} Hz`).toBeLessThan(7) // one stage: about 6 dB (the invented data)
      expect(pairDb - stageDb, `${f} Hz`).toBeGreaterThan(14)
    }
  })
})

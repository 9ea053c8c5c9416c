import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { butlerMatrix4x4, EXAMPLES, lineChain } from '../../../shared/examples/index'
import { prepareNetwork, solveDocument } from '../../../shared/solver/index'
import { s, solveAt } from './helpers'

const F0 = 2.45e9

describe('shipped examples', () => {
  for (const [name, document] of Object.entries(EXAMPLES)) {
    it(`${name}: the JSON file equals the TypeScript example, is valid and solves its own sweep`, () => {
      const json = JSON.parse(readFileSync(new URL(`../../../shared/examples/${name}.json`, import.meta.url), 'utf8'))
      expect(json).toEqual(JSON.parse(JSON.stringify(document)))
      const solved = solveDocument(json)
      expect(solved.ok).toBe(true)
      for (const block of document.blocks) expect(block.layout, `${name} ${block.id}`).toBeDefined()
    })
  }

  it('the 4×4 matrix gives each input equal amplitudes with progressive phase at f0', () => {
    // Common practice for a 4×4 beamforming matrix: equal amplitudes (−6.02 dB = 1/4 of the power) at the
    // four outputs and a progressive phase of ±45° or ±135° per input (Hansen, Phased Array Antennas, 2nd ed., [memory]).
    const r = solveAt(butlerMatrix4x4, [F0])
    const progression: number[] = []
    for (let input = 1; input <= 4; input++) {
      const outs = [5, 6, 7, 8].map(o => s(r, o, input))
      for (const x of outs) expect(20 * Math.log10(Math.hypot(...x))).toBeCloseTo(-6.0206, 6)
      const phases = outs.map(x => Math.atan2(x[1], x[0]) * 180 / Math.PI)
      const steps = phases.slice(1).map((p, i) => ((p - phases[i]! + 540) % 360) - 180)
      for (const step of steps) expect(step).toBeCloseTo(steps[0]!, 6)
      progression.push(Math.round(steps[0]!))
      // Inputs are matched and isolated from each other at f0.
      for (let other = 1; other <= 4; other++) expect(Math.hypot(...s(r, other, input))).toBeLessThan(1e-9)
    }
    expect(progression.sort((a, b) => a - b)).toEqual([-135, -45, 45, 135])
  })

  it('the number of joins of a line chain grows linearly with its length', () => {
    // Cascades must be linear in length: the number of joins grows by a fixed amount per section.
    const steps = [10, 100, 1000].map(n => {
      const prepared = prepareNetwork(lineChain(n))
      if (!prepared.ok) throw new Error('chain did not prepare')
      return prepared.network.compiled.stepCount
    })
    expect(steps[1]! - steps[0]!).toBe((steps[2]! - steps[1]!) / 10)
  })
})

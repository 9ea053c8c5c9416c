import { microstripSweep } from '../../microstrip/analyse-microstrip'
import { C0 } from '../../microstrip/constants'
import { teeRangeNotes } from '../../microstrip/discontinuity-range-notes'
import { teeJunction } from '../../microstrip/tee-junction'
import { threeArmJunctionS, type JunctionArm } from '../math/three-arm-junction-s'
import type { BlockModel } from '../types'

/**
 * Tee junction of microstrips (Portwright's extension): a main line of `mainWidth` through terminals 1
 * and 2 and a branch of `branchWidth` at terminal 3, all on one substrate. The terminals sit on the
 * centre lines (1 and 2 on the branch's, 3 on the main line's), where a design measures its arms from,
 * so the block holds what the junction does beyond an ideal node: Hammerstad's 1981 equivalent circuit
 * (see shared/microstrip/tee-junction.ts) with the reference-plane shifts as lossless lines of −d1
 * (main arms, Z1(f)) and −d2 (branch, Z2(f)), the transformer n in the branch and B_T at the node.
 * S at the document's reference impedance.
 */
export const microstripTeeModel: BlockModel = {
  type: 'microstripTee',
  terminals: 3,
  description: 'Tee junction of microstrips (Hammerstad\'s reference-plane shifts, turns ratio and susceptance)',
  params: {
    substrate: { kind: 'text', required: true },
    mainWidth: { kind: 'length', required: true, above: 0 },
    branchWidth: { kind: 'length', required: true, above: 0 },
  },
  create(values, context) {
    const found = context.substrate(values.substrate as string)
    if (!found.ok) return { ok: false, problems: [{ field: 'substrate', message: found.message }] }
    const substrate = found.substrate
    const mainWidth = values.mainWidth as number, branchWidth = values.branchWidth as number
    const main = microstripSweep(substrate, mainWidth), branch = microstripSweep(substrate, branchWidth)
    const r = context.referenceImpedance
    const arms: JunctionArm[] = [0, 1, 2].map(() => ({ radians: 0, impedance: r, turns: 1 }))
    const atStatic = teeJunction(main(0), branch(0), substrate.height, substrate.permittivity, 0)
    return {
      ok: true,
      notes: teeRangeNotes(atStatic.cutoff, atStatic.branchShift),
      instance: {
        terminals: 3,
        refs: Float64Array.of(r, r, r),
        reciprocal: true,
        constant: false,
        shareKey: `microstripTee:${JSON.stringify(substrate)}:${mainWidth}:${branchWidth}:${r}`,
        fill(frequency, re, im) {
          const a = main(frequency), b = branch(frequency)
          const tee = teeJunction(a, b, substrate.height, substrate.permittivity, frequency)
          const k = (2 * Math.PI * frequency) / C0
          const mainRadians = -k * Math.sqrt(a.epsEff) * tee.mainShift
          arms[0]!.radians = mainRadians
          arms[0]!.impedance = a.impedance
          arms[1]!.radians = mainRadians
          arms[1]!.impedance = a.impedance
          arms[2]!.radians = -k * Math.sqrt(b.epsEff) * tee.branchShift
          arms[2]!.impedance = b.impedance
          arms[2]!.turns = Math.sqrt(Math.max(tee.turnsSquared, 1e-6))
          threeArmJunctionS(arms, tee.susceptance, r, re, im)
          return true
        },
      },
    }
  },
}

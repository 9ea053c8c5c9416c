import type { ParamValues } from '../../network/params'

/** Load and series parameters: series R-L-C, or a named end. */
export const RLC_PARAMS = {
  resistance: { kind: 'resistance', min: 0 },
  inductance: { kind: 'inductance', min: 0 },
  capacitance: { kind: 'capacitance', above: 0 },
  end: { kind: 'choice', choices: ['open', 'short', 'matched'] },
} as const

/** Checks that R-L-C and `end` are not mixed. */
export function checkRlc(values: ParamValues): Array<{ field?: string; message: string }> {
  if (values.end !== undefined && (values.resistance !== undefined || values.inductance !== undefined || values.capacitance !== undefined)) {
    return [{ field: 'end', message: 'give either end or resistance/inductance/capacitance, not both' }]
  }
  return []
}

/**
 * Impedance of a series R-L-C as a ratio num/den with den = jωC when a capacitor is
 * present (else 1), so an open capacitor at DC stays finite: out = [numRe, numIm, denRe, denIm].
 */
export function rlcImpedance(values: ParamValues, referenceImpedance: number, frequency: number, out: Float64Array): void {
  const omega = 2 * Math.PI * frequency
  if (values.end !== undefined) {
    if (values.end === 'open') out.set([1, 0, 0, 0])
    else if (values.end === 'short') out.set([0, 0, 1, 0])
    else out.set([referenceImpedance, 0, 1, 0])
    return
  }
  const r = (values.resistance as number | undefined) ?? 0
  const l = (values.inductance as number | undefined) ?? 0
  const c = values.capacitance as number | undefined
  if (c === undefined) {
    out[0] = r; out[1] = omega * l; out[2] = 1; out[3] = 0
    return
  }
  // Z·jωC = 1 − ω²LC + jωRC
  out[0] = 1 - omega * omega * l * c; out[1] = omega * r * c; out[2] = 0; out[3] = omega * c
}

/**
 * The document's spec (contract 1.1) as the Spec view edits it: first
 * defaults drawn from the network, blank conditions of each kind, and whether
 * a result meets the spec over its band.
 */
import type { NetworkDocument, SpecConditionSpec, SpecDocument } from '~~/shared/network/types'
import { conditionMargin, describeCondition, type SpecMask } from '~~/shared/rf'
import type { SolvedData } from '~~/app/workers/protocol'
import { nearestIndex, phaseDifference, traceSamples } from './traces'

export type Measure = SpecConditionSpec['measure']

/** Words for each measure in the view's pickers. */
export const MEASURE_LABELS: Record<Measure, string> = {
  returnLoss: 'Return loss', vswr: 'VSWR', insertionLoss: 'Insertion loss', isolation: 'Isolation', coupling: 'Coupling',
  amplitudeImbalance: 'Amplitude imbalance', phaseDifference: 'Phase difference',
}

/** A new condition of a kind, with values that suit a first try. */
export function blankCondition(measure: Measure, ports: number): SpecConditionSpec {
  const a = Math.min(2, ports)
  const b = Math.min(3, ports)
  switch (measure) {
    case 'returnLoss': return { measure, port: 1, min: 20 }
    case 'vswr': return { measure, port: 1, max: 1.5 }
    case 'amplitudeImbalance': return { measure, from: 1, to: [a, b], max: 0.5 }
    case 'phaseDifference': return { measure, from: 1, to: [a, b], target: 90, tolerance: 5 }
    case 'insertionLoss': return { measure, from: 1, to: a, max: 3.5 }
    default: return { measure, from: 1, to: a, min: 20 }
  }
}

/** The phase target nearest to a measured difference, and the port order that makes it 0°, +90° or 180°. */
export function phaseTargetFor(measured: number, pair: [number, number]): { target: number, to: [number, number] } {
  const candidates = [0, 90, -90, 180]
  const nearest = candidates.reduce((best, t) => (Math.abs(phaseDifference(measured, t)) < Math.abs(phaseDifference(measured, best)) ? t : best))
  return nearest === -90 ? { target: 90, to: [pair[1], pair[0]] } : { target: nearest, to: pair }
}

/**
 * First spec of a network: centre at `f0` when the document defines it (else the
 * sweep's middle), return loss at every port, and for three ports or more the
 * balance from port 1 (the first port as input) to its two strongest outputs
 * at the centre, with the phase target nearest the response (0°, 90° or 180°).
 */
export function defaultSpec(doc: NetworkDocument, result: SolvedData): SpecDocument {
  const f = result.frequencies
  const middle = f.length ? (f[0]! + f[f.length - 1]!) / 2 : 1e9
  const center = doc.variables && 'f0' in doc.variables ? 'f0' : Number(middle.toPrecision(6))
  const conditions: SpecConditionSpec[] = Array.from({ length: Math.min(result.ports, 8) }, (_, k) => ({ measure: 'returnLoss' as const, port: k + 1, min: 20 }))
  if (result.ports >= 3) {
    const centreHz = typeof center === 'number' ? center : middle
    const k = nearestIndex(f, centreHz)
    const power = (i: number) => {
      const s = traceSamples(result, { i, j: 1 })
      return s.re[k]! ** 2 + s.im[k]! ** 2
    }
    const outputs = Array.from({ length: result.ports - 1 }, (_, n) => n + 2).sort((a, b) => power(b) - power(a)).slice(0, 2).sort((a, b) => a - b) as [number, number]
    const angle = (i: number) => {
      const s = traceSamples(result, { i, j: 1 })
      return (Math.atan2(s.im[k]!, s.re[k]!) * 180) / Math.PI
    }
    const phase = phaseTargetFor(phaseDifference(angle(outputs[0]), angle(outputs[1])), outputs)
    conditions.push({ measure: 'amplitudeImbalance', from: 1, to: outputs, max: 0.5 })
    conditions.push({ measure: 'phaseDifference', from: 1, to: phase.to, target: phase.target, tolerance: 5 })
  }
  return { center, conditions }
}

/** Put a spec in a document draft; a document with a spec is version 1.1. */
export function writeSpec(draft: NetworkDocument, spec: SpecDocument): void {
  draft.spec = spec
  draft.version = 1.1
}

/** Whether every condition holds at every swept frequency inside the band (or at the centre alone without one). */
export function meetsSpec(result: SolvedData, spec: SpecMask): { meets: boolean, points: number, failing?: string } {
  const f = result.frequencies
  const inside: number[] = []
  if (spec.band) {
    for (let k = 0; k < f.length; k++) if (f[k]! >= spec.band.start && f[k]! <= spec.band.stop) inside.push(k)
  }
  else if (f.length) inside.push(nearestIndex(f, spec.center))
  if (!inside.length) return { meets: false, points: 0 }
  for (const condition of spec.conditions) {
    const margin = conditionMargin(result, condition)
    if (inside.some(k => !(margin[k]! >= 0))) return { meets: false, points: inside.length, failing: describeCondition(condition) }
  }
  return { meets: true, points: inside.length }
}

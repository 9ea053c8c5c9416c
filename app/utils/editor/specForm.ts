import type { SpecCondition, SpecMask } from '~~/shared/rf'

/** What the Spec view's form holds. */
export interface SpecForm {
  centre: number
  returnLossDb: number
  /** 'all' or one port number. */
  ports: 'all' | number
  useBalance: boolean
  from: number
  to: [number, number]
  maxImbalanceDb: number
  targetPhaseDeg: number
  phaseToleranceDeg: number
}

/** The spec mask the solver's bandwidth finder takes, from the form. */
export function specMaskFrom(form: SpecForm, ports: number): SpecMask {
  const rlPorts = form.ports === 'all' ? Array.from({ length: ports }, (_, k) => k + 1) : [form.ports]
  const conditions: SpecCondition[] = rlPorts.map(port => ({ measure: 'returnLoss', port, min: form.returnLossDb }))
  if (form.useBalance) {
    conditions.push({ measure: 'amplitudeImbalance', from: form.from, to: form.to, max: form.maxImbalanceDb })
    conditions.push({ measure: 'phaseDifference', from: form.from, to: form.to, target: form.targetPhaseDeg, tolerance: form.phaseToleranceDeg })
  }
  return { center: form.centre, conditions }
}

/** Touchstone export of a solve result with the choices of the results dock's Export menu. */
import { writeTouchstone } from '~~/shared/touchstone/write'
import type { FrequencyUnit, NumberFormat } from '~~/shared/touchstone/types'
import type { SolvedData } from '~~/app/workers/protocol'

/** What the user chose: version, ports (numbered from 1, in order), number format and frequency unit. */
export interface TouchstoneChoice {
  version: '1.1' | '2.0'
  ports: number[]
  format: NumberFormat
  unit: FrequencyUnit
}

/** The export's first choice: version 1.1 when the ports share one reference impedance, every port, RI, GHz. */
export function defaultTouchstoneChoice(result: Pick<SolvedData, 'ports' | 'impedances'>): TouchstoneChoice {
  const uniform = result.impedances.every(z => z === result.impedances[0])
  return { version: uniform ? '1.1' : '2.0', ports: Array.from({ length: result.ports }, (_, k) => k + 1), format: 'RI', unit: 'GHZ' }
}

/** Why the choice cannot be written, in the user's words; null when it can. */
export function touchstoneChoiceProblem(result: Pick<SolvedData, 'ports' | 'impedances'>, choice: TouchstoneChoice): string | null {
  if (!choice.ports.length) return 'Choose at least one port to export.'
  if (choice.ports.some(p => !Number.isInteger(p) || p < 1 || p > result.ports)) return `Ports are numbered 1 to ${result.ports}.`
  const impedances = choice.ports.map(p => result.impedances[p - 1])
  if (choice.version === '1.1' && impedances.some(z => z !== impedances[0])) {
    return 'Version 1.1 has one reference impedance for every port, and the chosen ports differ: choose version 2.0.'
  }
  return null
}

/**
 * The Touchstone text of a result: a comment naming the network and when it was written,
 * the simulated-results caution, then the data as chosen. Throws RangeError for a choice
 * `touchstoneChoiceProblem` refuses.
 */
export function touchstoneText(result: SolvedData, choice: TouchstoneChoice, context: { name: string, when: Date }): string {
  const problem = touchstoneChoiceProblem(result, choice)
  if (problem) throw new RangeError(problem)
  return writeTouchstone(result, {
    comments: [`${context.name}: S-parameters exported from Portwright on ${context.when.toISOString()}`],
    caution: true,
    version: choice.version,
    format: choice.format,
    unit: choice.unit,
    ports: choice.ports,
  })
}

/** File name of the export: `<stem>.s<N>p`. */
export function touchstoneFileName(stem: string, ports: number): string {
  return `${stem}.s${ports}p`
}

/**
 * The Array view's choices, saved with the network under a document key of the editor's own:
 * `view.array: { inputs, outputs, spacing, spacingUnit, elementExponent, frequency }` (the contract keeps unknown
 * keys). What is read back is checked, because a document may come from anyone.
 */
import type { NetworkDocument } from '~~/shared/network/types'

export interface ArrayViewChoice {
  /** Ports fed one at a time, each making one beam. */
  inputs: number[]
  /** Ports feeding the elements, in element order. */
  outputs: number[]
  spacing: number
  /** Spacing in wavelengths at the frequency shown, or a fixed length in metres. */
  spacingUnit: 'wavelengths' | 'm'
  /** Element power pattern cosⁿθ; 0 for isotropic elements. */
  elementExponent: number
  /** Frequency shown (Hz), or null for the middle of the sweep. */
  frequency: number | null
}

/** Most ports in either list: the figures are for arrays an engineer draws, not for thousands of elements. */
export const MAX_ARRAY_PORTS = 64

const portList = (value: unknown): number[] | null =>
  Array.isArray(value) && value.length <= MAX_ARRAY_PORTS && value.every(p => Number.isInteger(p) && p >= 1 && p <= 999) ? [...value] as number[] : null

/** The saved choices, or null when the document keeps none (or keeps something unreadable). */
export function savedArrayView(doc: NetworkDocument): ArrayViewChoice | null {
  const view = doc.view as { array?: Record<string, unknown> } | undefined
  const a = view && typeof view === 'object' ? view.array : undefined
  if (!a || typeof a !== 'object') return null
  const inputs = portList(a.inputs)
  const outputs = portList(a.outputs)
  const spacing = typeof a.spacing === 'number' && Number.isFinite(a.spacing) && a.spacing > 0 && a.spacing <= 100 ? a.spacing : null
  const spacingUnit = a.spacingUnit === 'm' ? 'm' : a.spacingUnit === 'wavelengths' ? 'wavelengths' : null
  const elementExponent = typeof a.elementExponent === 'number' && Number.isFinite(a.elementExponent) && a.elementExponent >= 0 && a.elementExponent <= 20 ? a.elementExponent : 0
  const frequency = typeof a.frequency === 'number' && Number.isFinite(a.frequency) && a.frequency > 0 ? a.frequency : null
  if (!inputs || !outputs || spacing === null || !spacingUnit) return null
  return { inputs, outputs, spacing, spacingUnit, elementExponent, frequency }
}

/** Writes the choices into a document draft, keeping any other view keys. */
export function saveArrayView(draft: NetworkDocument, choice: ArrayViewChoice): void {
  const view = draft.view && typeof draft.view === 'object' ? draft.view as Record<string, unknown> : {}
  draft.view = { ...view, array: { ...choice, inputs: [...choice.inputs], outputs: [...choice.outputs] } }
}

/** Speed of light in vacuum, m/s (exact by the SI definition of the metre). */
const C0 = 299_792_458

/** Element spacing in wavelengths at a frequency. */
export function spacingWavelengths(choice: Pick<ArrayViewChoice, 'spacing' | 'spacingUnit'>, frequency: number): number {
  return choice.spacingUnit === 'wavelengths' ? choice.spacing : (choice.spacing * frequency) / C0
}

/** Reads "1, 2, 3" into port numbers; null with a message naming what is wrong. */
export function parsePortList(text: string, ports: number): { ok: true; list: number[] } | { ok: false; message: string } {
  const parts = text.split(/[\s,]+/).filter(Boolean)
  if (!parts.length) return { ok: false, message: 'list at least one port' }
  if (parts.length > MAX_ARRAY_PORTS) return { ok: false, message: `at most ${MAX_ARRAY_PORTS} ports` }
  const list: number[] = []
  for (const p of parts) {
    const n = Number(p)
    if (!Number.isInteger(n) || n < 1) return { ok: false, message: `"${p}" is not a port number` }
    if (n > ports) return { ok: false, message: `port ${n} does not exist (the network has ${ports} ports)` }
    if (list.includes(n)) return { ok: false, message: `port ${n} is listed twice` }
    list.push(n)
  }
  return { ok: true, list }
}

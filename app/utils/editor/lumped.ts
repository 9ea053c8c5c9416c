import type { ParamValue } from './blockCatalog'

/** One drawn part of a load or series block. */
export type LumpedPart = 'R' | 'L' | 'C' | 'open' | 'short'

function present(v: ParamValue | undefined): boolean {
  return v !== undefined && v !== '' && v !== 0 && v !== '0'
}

/** Which IEC parts a load/series symbol shows for its parameters (a matched end is a resistor). */
export function lumpedParts(params: Record<string, ParamValue>): LumpedPart[] {
  if (params.end === 'open') return ['open']
  if (params.end === 'short') return ['short']
  if (params.end === 'matched') return ['R']
  const parts: LumpedPart[] = []
  if (present(params.resistance)) parts.push('R')
  if (present(params.inductance)) parts.push('L')
  if (params.capacitance !== undefined && params.capacitance !== '') parts.push('C')
  return parts.length ? parts : ['short']
}

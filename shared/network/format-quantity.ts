import { QUANTITIES, type QuantityKind } from './quantities'

const PREFIXES: ReadonlyArray<readonly [number, string]> = [
  [1e12, 'T'], [1e9, 'G'], [1e6, 'M'], [1e3, 'k'], [1, ''], [1e-3, 'm'], [1e-6, 'µ'], [1e-9, 'n'], [1e-12, 'p'], [1e-15, 'f'],
]

function trimmed(value: number, digits: number): string {
  // toPrecision keeps 4 significant digits; Number() drops the trailing zeros it pads with.
  return String(Number(value.toPrecision(digits)))
}

/** Writes an SI value the way an engineer reads it, e.g. 35.36 Ω, 2.45 GHz, 0.5 mm, 90°. */
export function formatQuantity(value: number, kind: QuantityKind, digits = 4): string {
  const info = QUANTITIES[kind]
  if (!Number.isFinite(value)) return String(value)
  if (kind === 'angle') return `${trimmed(value, digits)}°`
  if (!info.prefixed || value === 0) return info.symbol ? `${trimmed(value, digits)} ${info.symbol}` : trimmed(value, digits)
  const magnitude = Math.abs(value)
  const [scale, prefix] = PREFIXES.find(([s]) => magnitude >= s * 0.9999995) ?? PREFIXES[PREFIXES.length - 1]!
  return `${trimmed(value / scale, digits)} ${prefix}${info.symbol}`
}

import { C0 } from '../microstrip/constants'
import { coupledMicrostripStatic } from '../microstrip/coupled-static'
import type { MicrostripSubstrate } from '../microstrip/types'
import { evaluateQuantity } from '../network/expression'
import type { NetworkDocument } from '../network/types'
import { evaluateVariables } from '../network/variables'
import { tidy } from './document-parts'
import { DESIGN_SUBSTRATE, remeasureBand, substrateEntry } from './microstrip-medium'

/** Width, gap (m) and the modes' effective permittivities of a coupled pair. */
export interface CoupledStrips { width: number, gap: number, evenEpsEff: number, oddEpsEff: number }

/** Bisection in ln x over [lo, hi] for a root of a function that falls as x grows. */
function fallingRoot(f: (x: number) => number, lo: number, hi: number): number | undefined {
  if (f(lo) < 0 || f(hi) > 0) return undefined
  for (let i = 0; i < 100; i++) {
    const mid = Math.sqrt(lo * hi)
    if (f(mid) > 0) lo = mid
    else hi = mid
  }
  return Math.sqrt(lo * hi)
}

/**
 * Width and gap of coupled microstrips whose even and odd impedances (Garg & Bahl 1979, quasi-static)
 * are `even` and `odd` (Ω): for each gap the width with √(Ze·Zo) = √(even·odd) (both impedances fall as
 * the strips widen), then the gap with Ze/Zo = even/odd (the ratio falls as the gap opens).
 */
export function coupledStripsFor(substrate: MicrostripSubstrate, even: number, odd: number): CoupledStrips | { message: string } {
  const er = substrate.permittivity, h = substrate.height
  const widthFor = (g: number) => fallingRoot(u => {
    const m = coupledMicrostripStatic(u, g, er)
    return Math.sqrt(m.evenImpedance * m.oddImpedance) - Math.sqrt(even * odd)
  }, 1e-3, 100)
  const g = fallingRoot((gap) => {
    const u = widthFor(gap)
    if (u === undefined) return Number.NaN
    const m = coupledMicrostripStatic(u, gap, er)
    return m.evenImpedance / m.oddImpedance - even / odd
  }, 1e-3, 20)
  const u = g === undefined ? undefined : widthFor(g)
  if (g === undefined || u === undefined) return { message: `no width and gap give Ze = ${tidy(even)} Ω and Zo = ${tidy(odd)} Ω on this board (gap searched from 0.001 h to 20 h)` }
  const m = coupledMicrostripStatic(u, g, er)
  return { width: u * h, gap: g * h, evenEpsEff: m.evenEpsEff, oddEpsEff: m.oddEpsEff }
}

/**
 * The coupled-line assistant's document with its `coupled` block redrawn as `coupledMicrostrip` on one
 * substrate: width and gap for its even and odd impedances, length a quarter wave at f0 for the mean of
 * the two modes' phase constants. The spec band is measured again; it may be gone, since the modes'
 * unequal speeds limit the isolation of a microstrip coupler. Throws in the user's words when no pair fits.
 */
export function coupledLineInMicrostrip(document: NetworkDocument, substrate: MicrostripSubstrate, f0: number): NetworkDocument {
  const scope = evaluateVariables(document.variables).scope
  const out: NetworkDocument = structuredClone(document)
  for (const block of out.blocks) {
    if (block.type !== 'coupled') continue
    const even = evaluateQuantity(block.params.evenImpedance!, 'impedance', scope)
    const odd = evaluateQuantity(block.params.oddImpedance!, 'impedance', scope)
    if (!even.ok || !odd.ok) throw new Error(`coupled lines ${block.id} could not be evaluated`)
    const strips = coupledStripsFor(substrate, even.value, odd.value)
    if ('message' in strips) throw new Error(`coupled lines ${block.id}: ${strips.message}`)
    const length = C0 / (4 * f0 * 0.5 * (Math.sqrt(strips.evenEpsEff) + Math.sqrt(strips.oddEpsEff)))
    block.type = 'coupledMicrostrip'
    block.params = { substrate: DESIGN_SUBSTRATE, width: `${tidy(strips.width * 1e3)} mm`, gap: `${tidy(strips.gap * 1e3)} mm`, length: `${tidy(length * 1e3)} mm` }
  }
  out.substrates = { ...(out.substrates ?? {}), [DESIGN_SUBSTRATE]: substrateEntry(substrate) }
  out.name = `${out.name ?? 'Design'}, coupled microstrip εr ${tidy(substrate.permittivity)}, h ${tidy(substrate.height * 1e3)} mm`
  remeasureBand(out, f0)
  return out
}

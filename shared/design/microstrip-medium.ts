import { analyseMicrostrip } from '../microstrip/analyse-microstrip'
import { C0 } from '../microstrip/constants'
import { synthesiseWidth } from '../microstrip/synthesise-width'
import type { MicrostripSubstrate } from '../microstrip/types'
import { evaluateQuantity } from '../network/expression'
import type { NetworkDocument, Substrate } from '../network/types'
import { evaluateVariables } from '../network/variables'
import { metHalfWidth, tidy } from './document-parts'

/** Name of the substrate a design in microstrip places. */
export const DESIGN_SUBSTRATE = 'board'

/** A strip for one ideal line: width from the impedance, length from ε_eff at f0 (both with dispersion at f0). */
export interface StripSize { width: number, length: number, epsEff: number }

/** Width and physical length (m) of a microstrip of impedance z that is `degrees` long at f0. */
export function stripFor(substrate: MicrostripSubstrate, impedance: number, degrees: number, f0: number): StripSize | { message: string } {
  const width = synthesiseWidth(substrate, impedance, f0)
  if (!width.ok) return { message: width.message }
  const { epsEff } = analyseMicrostrip(substrate, width.width, f0)
  return { width: width.width, length: (degrees / 360) * C0 / (f0 * Math.sqrt(epsEff)), epsEff }
}

/** The document form of a substrate given in SI units (metres written in mm and µm). */
export function substrateEntry(s: MicrostripSubstrate): Substrate {
  const entry: Substrate = { permittivity: tidy(s.permittivity), height: `${tidy(s.height * 1e3)} mm` }
  if (s.thickness > 0) entry.thickness = `${tidy(s.thickness * 1e6)} um`
  if (s.lossTangent > 0) entry.lossTangent = tidy(s.lossTangent)
  if (s.conductivity !== undefined) entry.conductivity = tidy(s.conductivity)
  if (s.roughness > 0) entry.roughness = `${tidy(s.roughness * 1e6)} um`
  return entry
}

/**
 * A designed document of ideal `line` blocks redrawn in microstrip on one substrate: each line
 * becomes a `microstrip` of the width whose Z0(f0) is the line's impedance and the length that is
 * the line's electrical length at f0 (ε_eff(f0), dispersion included). Other blocks stay; junctions
 * are ideal nodes. The spec band is measured again on the result. Throws with the user's words
 * when a line cannot be made on this board (an impedance no width reaches).
 */
export function inMicrostrip(document: NetworkDocument, substrate: MicrostripSubstrate, f0: number): NetworkDocument {
  const scope = evaluateVariables(document.variables).scope
  const out: NetworkDocument = structuredClone(document)
  for (const block of out.blocks) {
    if (block.type !== 'line') continue
    const z = evaluateQuantity(block.params.impedance!, 'impedance', scope)
    const degrees = evaluateQuantity(block.params.degrees ?? 90, 'angle', scope)
    if (!z.ok || !degrees.ok) throw new Error(`line ${block.id} could not be evaluated`)
    const size = stripFor(substrate, z.value, degrees.value, f0)
    if ('message' in size) throw new Error(`arm ${block.id} (${tidy(z.value)} Ω): ${size.message}`)
    block.type = 'microstrip'
    block.params = { substrate: DESIGN_SUBSTRATE, width: `${tidy(size.width * 1e3)} mm`, length: `${tidy(size.length * 1e3)} mm` }
  }
  out.substrates = { ...(out.substrates ?? {}), [DESIGN_SUBSTRATE]: substrateEntry(substrate) }
  out.name = `${out.name ?? 'Design'}, microstrip εr ${tidy(substrate.permittivity)}, h ${tidy(substrate.height * 1e3)} mm`
  remeasureBand(out, f0)
  return out
}

/** Measures a designed document's spec band again (in place), after its blocks changed. */
export function remeasureBand(document: NetworkDocument, f0: number): void {
  if (!document.spec) return
  delete document.spec.band
  const half = metHalfWidth(document, f0, (document.spec.conditions ?? []) as unknown as Parameters<typeof metHalfWidth>[2])
  if (half !== undefined && half > 0) document.spec.band = { start: `${tidy(1 - half)} * f0`, stop: `${tidy(1 + half)} * f0` }
}

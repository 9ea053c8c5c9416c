/**
 * `npm run -s design:table`
 * Prints, for each assistant and a few typical asks, the spec it writes and the band it achieves
 * (Markdown): the spec band (symmetric about f0, rounded down to 0.5 %) and the widest band around f0
 * over which the solved design meets every condition, both over f0. Each ask is run through
 * `runDesign`, as `npm run -s design` does; "microstrip" is the invented demo board QL-350
 * (εr 3.5, h 0.508 mm, t 35 µm, lossless; coupled lines as coupled microstrips) and 4001 points over the design's own sweep.
 */
import { runDesign, type DesignKind } from '../shared/design/index'
import { resolveSpec } from '../shared/network/spec'
import { describeCondition, findBandwidth } from '../shared/rf/index'
import { solveDocument } from '../shared/solver/index'

const base = { frequency: '2.45 GHz', impedance: '50' }
const board = { 'substrate-permittivity': '3.5', 'substrate-height': '0.508 mm', 'substrate-thickness': '35 um' }
const asks: Array<[string, DesignKind, Record<string, string>]> = [
  ['quadrature, 3 dB, 1 section', 'quadrature', { sections: '1' }],
  ['quadrature, 3 dB, 2 sections', 'quadrature', { sections: '2' }],
  ['quadrature, 3 dB, 3 sections', 'quadrature', { sections: '3' }],
  ['ring', 'ring', {}],
  ['divider, equal', 'divider', {}],
  ['divider, 3 dB unequal', 'divider', { 'ratio-db': '3' }],
  ['transformer 50→100 Ω, binomial, 3 sections', 'transformer', { load: '100', sections: '3', response: 'binomial' }],
  ['transformer 50→100 Ω, Chebyshev, 3 sections, Γm 0.05', 'transformer', { load: '100', sections: '3', response: 'chebyshev' }],
  ['coupled-line, 10 dB', 'coupled-line', { 'coupling-db': '10' }],
  ['coupled-line, 20 dB', 'coupled-line', { 'coupling-db': '20' }],
]

const percent = (x: number) => `${(100 * x).toFixed(1)} %`

/** Spec band and achieved band of one design, over f0. */
function measure(kind: DesignKind, given: Record<string, string>): { conditions: string, spec: string, reach: string } {
  const designed = runDesign(kind, { ...base, ...given })
  if (!designed.ok) return { conditions: '', spec: designed.problems.map(p => `--${p.option}: ${p.message}`).join('; '), reach: '' }
  const document = designed.document
  const resolved = resolveSpec(document)
  if (!resolved?.ok) throw new Error(`${kind}: its spec does not resolve`)
  const solved = solveDocument(document, { sweep: { points: 4001 } })
  if (!solved.ok) throw new Error(`${kind}: ${solved.problems.map(p => p.message).join('; ')}`)
  const { spec } = resolved
  const band = spec.band ? percent((spec.band.stop - spec.band.start) / spec.center) : 'at f0 only'
  const found = findBandwidth(solved.result, { center: spec.center, conditions: spec.conditions })
  return { conditions: spec.conditions.map(describeCondition).join('; '), spec: band, reach: found.ok ? percent(found.fractional) : 'none' }
}

const rows = ['| asked (f0 2.45 GHz, Z0 50 Ω) | spec conditions | ideal lines: spec band / every condition holds | microstrip QL-350: spec band / every condition holds |', '|---|---|---|---|']
for (const [label, kind, given] of asks) {
  const ideal = measure(kind, given)
  const strip = measure(kind, { ...given, ...board })
  rows.push(`| ${label} | ${ideal.conditions} | ${ideal.spec} / ${ideal.reach} | ${strip.spec} / ${strip.reach} |`)
}
process.stdout.write(`${rows.join('\n')}\n`)

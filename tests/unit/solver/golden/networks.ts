// The networks whose S the solver regression test pins: every shipped example and test networks
// that reach each join path (merge, loop, junctions with mixed references, open terminals,
// non-reciprocal data, nested subnetworks, microstrip, a singular frequency). Invented values.
import { EXAMPLES } from '../../../../shared/examples/index'
import type { DataSet, PrepareOptions } from '../../../../shared/solver/index'
import { doc, port } from '../helpers'

/** A network to pin: the document, the frequencies (Hz) and the prepare options it needs. */
export interface GoldenNetwork {
  document: unknown
  frequencies: number[]
  options?: PrepareOptions
}

const F0 = 2.45e9
/** Band edges, the design frequency and a few odd points in between (chunk boundaries included by count). */
const spread = (start: number, stop: number): number[] => [start, start + (stop - start) * 0.137, (start + stop) / 2, F0, start + (stop - start) * 0.861, stop]

/** A non-reciprocal two-port: a lossy isolator-like data set with S12 ≠ S21. */
function oneWay(): DataSet {
  const frequencies = [1e9, 2e9, 3e9, 4e9]
  const re = new Float64Array(16), im = new Float64Array(16)
  frequencies.forEach((f, k) => {
    const phase = -2 * Math.PI * f * 0.2e-9
    re[k * 4 + 0] = 0.05; im[k * 4 + 0] = 0.02 * k
    re[k * 4 + 1] = 0.01 * Math.cos(phase); im[k * 4 + 1] = 0.01 * Math.sin(phase)
    re[k * 4 + 2] = 0.9 * Math.cos(phase); im[k * 4 + 2] = 0.9 * Math.sin(phase)
    re[k * 4 + 3] = -0.03; im[k * 4 + 3] = 0.04
  })
  return { ports: 2, impedances: [50, 50], frequencies: Float64Array.from(frequencies), re, im }
}

const section = doc(
  [port(1), port(2), { id: 'T', type: 'line', params: { impedance: '35 ohm', degrees: 60, at: 'f0' } }, { id: 'S', type: 'stub', params: { impedance: '70 ohm', degrees: 40, at: 'f0', end: 'short' } }],
  [['P1.1', 'T.1'], ['T.2', 'S.1'], ['T.2', 'P2.1']],
)

/** Test networks by name. */
export const GOLDEN_NETWORKS: Record<string, GoldenNetwork> = {
  ...Object.fromEntries(Object.entries(EXAMPLES).map(([name, document]) => [`example ${name}`, { document, frequencies: spread(2e9, 2.9e9) }])),
  // Four lines in a ring, ports at three corners, a 75 Ω port: junctions with mixed references and a loop.
  'ring of lines with mixed references': {
    document: doc(
      [port(1), port(2, { impedance: '75 ohm' }), port(3),
        { id: 'A', type: 'line', params: { impedance: '50 ohm', degrees: 90, at: 'f0' } },
        { id: 'B', type: 'line', params: { impedance: '60 ohm', degrees: 75, at: 'f0', lossDb: 0.2 } },
        { id: 'C', type: 'line', params: { impedance: '40 ohm', degrees: 120, at: 'f0' } },
        { id: 'D', type: 'line', params: { impedance: '55 ohm', degrees: 33, at: 'f0' } },
        { id: 'R', type: 'load', params: { resistance: 20, inductance: '1 nH' } }],
      [['P1.1', 'A.1'], ['A.2', 'B.1'], ['B.2', 'C.1'], ['C.2', 'D.1'], ['D.2', 'A.1'], ['A.2', 'P2.1'], ['C.1', 'P3.1'], ['C.1', 'R.1']],
    ),
    frequencies: spread(0.5e9, 5e9),
  },
  'ideal and modelled hybrids, divider, attenuator, phase, series, open terminal': {
    document: doc(
      [port(1), port(2), port(3), port(4),
        { id: 'H', type: 'hybrid180', params: { model: 'ring', at: 'f0' } },
        { id: 'Q', type: 'hybrid90', params: { model: 'ideal', couplingDb: 4.5 } },
        { id: 'W', type: 'divider', params: { model: 'lines', at: 'f0', ratioDb: 3 } },
        { id: 'X', type: 'attenuator', params: { db: 3 } },
        { id: 'F', type: 'phase', params: { degrees: -30 } },
        { id: 'Z', type: 'series', params: { resistance: 5, capacitance: '4 pF' } },
        { id: 'O', type: 'line', params: { impedance: '45 ohm', degrees: 20, at: 'f0' } }],
      [['P1.1', 'H.1'], ['H.2', 'Q.1'], ['H.3', 'W.1'], ['H.4', 'X.1'], ['X.2', 'F.1'], ['F.2', 'P2.1'], ['Q.2', 'Z.1'], ['Z.2', 'P3.1'], ['Q.3', 'W.2'], ['Q.4', 'O.1'], ['W.3', 'P4.1']],
    ),
    frequencies: spread(1e9, 4e9),
  },
  'coupled section': {
    document: doc(
      [port(1), port(2), port(3), port(4), { id: 'K', type: 'coupled', params: { evenImpedance: '69.5 ohm', oddImpedance: '36 ohm', degrees: 90, at: 'f0' } }],
      [['P1.1', 'K.1'], ['P2.1', 'K.2'], ['P3.1', 'K.3'], ['P4.1', 'K.4']],
    ),
    frequencies: spread(1e9, 4e9),
  },
  'non-reciprocal data block between lines': {
    document: doc(
      [port(1), port(2), { id: 'D', type: 'data', params: { file: 'one-way.s2p' } }, { id: 'L', type: 'line', params: { impedance: '50 ohm', degrees: 45, at: 'f0' } }, { id: 'S', type: 'stub', params: { impedance: '50 ohm', degrees: 30, at: 'f0', end: 'open' } }],
      [['P1.1', 'L.1'], ['L.2', 'D.1'], ['L.2', 'S.1'], ['D.2', 'P2.1']],
    ),
    frequencies: [1e9, 1.7e9, 2.45e9, 3.3e9, 4e9],
    options: { resolveData: () => oneWay() },
  },
  'subnetworks used twice with a load': {
    document: doc(
      [port(1), port(2), { id: 'A', type: 'subnetwork', params: { network: 'section' } }, { id: 'B', type: 'subnetwork', params: { network: 'section' } }, { id: 'R', type: 'load', params: { resistance: 30 } }],
      [['P1.1', 'A.1'], ['A.2', 'B.1'], ['B.2', 'P2.1'], ['A.2', 'R.1']],
    ),
    frequencies: spread(1e9, 4e9),
    options: { resolveSubnetwork: () => section },
  },
  'microstrip with a step and an open end': {
    document: doc(
      [port(1), port(2),
        { id: 'M1', type: 'microstrip', params: { substrate: 'core', width: '1.1 mm', length: '12 mm' } },
        { id: 'M2', type: 'microstrip', params: { substrate: 'core', width: '2.3 mm', length: '7 mm' } },
        { id: 'ST', type: 'microstripStep', params: { substrate: 'core', width1: '1.1 mm', width2: '2.3 mm' } },
        { id: 'OE', type: 'microstripOpen', params: { substrate: 'core', width: '1.1 mm' } },
        { id: 'M3', type: 'microstrip', params: { substrate: 'core', width: '1.1 mm', length: '5 mm' } }],
      [['P1.1', 'M1.1'], ['M1.2', 'ST.1'], ['ST.2', 'M2.1'], ['M2.2', 'P2.1'], ['M1.2', 'M3.1'], ['M3.2', 'OE.1']],
      { substrates: { core: { permittivity: 3.5, height: '0.5 mm', thickness: '35 um', lossTangent: 0.003, conductivity: 5.8e7 } } },
    ),
    frequencies: spread(1e9, 6e9),
  },
  // Branch-line hybrid of lines at exactly 2·f0: a resonance cut off from the ports, solved from its neighbours.
  'branch-line of lines at its singular frequency': {
    document: EXAMPLES['branch-line-hybrid']!,
    frequencies: [2 * F0, 1.9 * F0, 2.1 * F0],
  },
}

import type { ComplexSeries, SParameterSet } from '../rf/types'
import { mirrorDecompose } from './mirror-decompose'
import { mirrorResidual } from './mirror-residual'
import type { MirrorPairs } from './types'

/** Γe, Γo, Te, To seen from port p over a sweep, and the worst mirror residual. */
export interface EvenOddSeries {
  gammaEven: ComplexSeries
  gammaOdd: ComplexSeries
  transEven: ComplexSeries
  transOdd: ComplexSeries
  /** Largest |S − recombined S| over every entry and frequency (see `mirrorResidual`). */
  worstResidual: number
}

/** Even/odd-mode reflection and transmission of a four-port's sweep about its mirror pairs. */
export function evenOddSweep(data: SParameterSet, pairs: MirrorPairs): EvenOddSeries {
  if (data.ports !== 4) throw new RangeError(`even/odd modes need a four-port, this is a ${data.ports}-port`)
  const n = data.frequencies.length
  const series = () => ({ re: new Float64Array(n), im: new Float64Array(n) })
  const out = { gammaEven: series(), gammaOdd: series(), transEven: series(), transOdd: series(), worstResidual: 0 }
  for (let k = 0; k < n; k++) {
    const { even, odd } = mirrorDecompose(data.re, data.im, pairs, k * 16)
    out.gammaEven.re[k] = even.s11.re; out.gammaEven.im[k] = even.s11.im
    out.gammaOdd.re[k] = odd.s11.re; out.gammaOdd.im[k] = odd.s11.im
    out.transEven.re[k] = even.s21.re; out.transEven.im[k] = even.s21.im
    out.transOdd.re[k] = odd.s21.re; out.transOdd.im[k] = odd.s21.im
    out.worstResidual = Math.max(out.worstResidual, mirrorResidual(data.re, data.im, pairs, k * 16))
  }
  return out
}

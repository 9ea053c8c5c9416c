/** S-parameters in the solver's layout, as `solve --format json` and `touchstone` print them. */
export interface SJsonSource {
  ports: number
  impedances: number[]
  frequencies: ArrayLike<number>
  re: ArrayLike<number>
  im: ArrayLike<number>
}

/** `{"ports": N, "impedances": [...], "frequencies": [...], "s": [[[[re, im], ...], ...], ...]}` with s[k][i][j] = S(i+1)(j+1). */
export function sParametersJson(data: SJsonSource): string {
  const n = data.ports
  const s = Array.from({ length: data.frequencies.length }, (_, k) =>
    Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => {
      const at = (k * n + i) * n + j
      return [data.re[at]!, data.im[at]!]
    })))
  return JSON.stringify({ ports: n, impedances: Array.from(data.impedances), frequencies: Array.from(data.frequencies), s })
}

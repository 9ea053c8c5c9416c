/** S-parameters in the solver's layout (a solve, or a Touchstone file read back): S(i+1)(j+1) at (k·ports + i)·ports + j. */
export interface SolveJsonSource {
  ports: number
  impedances: ArrayLike<number>
  frequencies: ArrayLike<number>
  re: ArrayLike<number>
  im: ArrayLike<number>
}

/** The contract's JSON form of a solve: `s[k][i][j]` = S(i+1)(j+1) at `frequencies[k]`, each as [re, im]. */
export interface SolveJson {
  ports: number
  impedances: number[]
  frequencies: number[]
  s: Array<Array<Array<[number, number]>>>
}

/** A solve result in the contract's JSON shape (`solve --format json`, `POST /api/v1/solve`). */
export function solveResultJson(result: SolveJsonSource): SolveJson {
  const n = result.ports
  const s = Array.from({ length: result.frequencies.length }, (_, k) =>
    Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j): [number, number] => {
      const at = (k * n + i) * n + j
      return [result.re[at]!, result.im[at]!]
    })))
  return { ports: n, impedances: Array.from(result.impedances), frequencies: Array.from(result.frequencies), s }
}

/**
 * The same text as `JSON.stringify(solveResultJson(result))`, written piece by piece so that a large answer
 * never exists twice as nested arrays (the server builds it inside a solve worker's heap budget).
 */
export function solveResultJsonText(result: SolveJsonSource): string {
  const n = result.ports
  const num = (x: number) => JSON.stringify(x)
  const rows: string[] = []
  for (let k = 0; k < result.frequencies.length; k++) {
    const matrix: string[] = []
    for (let i = 0; i < n; i++) {
      const row: string[] = []
      for (let j = 0; j < n; j++) {
        const at = (k * n + i) * n + j
        row.push(`[${num(result.re[at]!)},${num(result.im[at]!)}]`)
      }
      matrix.push(`[${row.join(',')}]`)
    }
    rows.push(`[${matrix.join(',')}]`)
  }
  const frequencies = Array.from(result.frequencies, num).join(',')
  return `{"ports":${n},"impedances":${JSON.stringify(Array.from(result.impedances))},"frequencies":[${frequencies}],"s":[${rows.join(',')}]}`
}

/** A trace of a data file's preview: its name (S11, S21 …) and |S| in dB at each frequency. */
export interface PreviewTrace {
  name: string
  values: Float64Array
}

/**
 * |S11| and |S21| in dB of a data set in the solver's layout (only |S11| for a one-port), for the
 * small preview in the inspector. A zero magnitude gives −Infinity, which the plot leaves out.
 */
export function dataPreviewTraces(data: { ports: number, frequencies: ArrayLike<number>, re: ArrayLike<number>, im: ArrayLike<number> }): PreviewTrace[] {
  const n = data.ports
  const count = data.frequencies.length
  const cells: Array<[string, number]> = n >= 2 ? [['S11', 0], ['S21', n]] : [['S11', 0]]
  return cells.map(([name, cell]) => {
    const values = new Float64Array(count)
    for (let k = 0; k < count; k++) {
      const at = k * n * n + cell
      values[k] = 20 * Math.log10(Math.hypot(data.re[at]!, data.im[at]!))
    }
    return { name, values }
  })
}

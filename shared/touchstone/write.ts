/** S-parameters in the solver's layout: S(i+1)(j+1) at frequency k at index (k·ports + i)·ports + j. */
export interface TouchstoneData {
  ports: number
  impedances: number[]
  frequencies: Float64Array | number[]
  re: Float64Array | number[]
  im: Float64Array | number[]
}

/** Options of `writeTouchstone`. */
export interface TouchstoneOptions {
  /** Comment lines written after `!` at the top. */
  comments?: string[]
}

// String(x) is the shortest text that reads back to the same double.
const num = (x: number): string => String(x)

function pairs(data: TouchstoneData, k: number, cells: Array<[number, number]>): string {
  const n = data.ports
  return cells.map(([i, j]) => {
    const at = (k * n + i) * n + j
    return `${num(data.re[at]!)} ${num(data.im[at]!)}`
  }).join('  ')
}

/**
 * Writes S-parameters as a Touchstone file (real/imaginary, Hz). Equal port impedances
 * give version 1.1 (`# HZ S RI R z`); unequal ones give version 2.0 with [Reference].
 * Two-ports are written S11 S21 S12 S22; three and four ports one matrix row per line;
 * five or more at most four pairs per line, each row starting a new line.
 */
export function writeTouchstone(data: TouchstoneData, options: TouchstoneOptions = {}): string {
  const n = data.ports
  const z0 = data.impedances[0] ?? 50
  const uniform = data.impedances.every(z => z === z0)
  const lines: string[] = (options.comments ?? []).map(c => `! ${c}`)
  if (uniform) {
    lines.push(`# HZ S RI R ${num(z0)}`)
  } else {
    lines.push('[Version] 2.0', `# HZ S RI R ${num(z0)}`, `[Number of Ports] ${n}`)
    if (n === 2) lines.push('[Two-Port Data Order] 21_12')
    lines.push(`[Number of Frequencies] ${data.frequencies.length}`, `[Reference] ${data.impedances.map(num).join(' ')}`, '[Network Data]')
  }
  for (let k = 0; k < data.frequencies.length; k++) {
    const f = num(data.frequencies[k]!)
    if (n === 1) lines.push(`${f} ${pairs(data, k, [[0, 0]])}`)
    else if (n === 2) lines.push(`${f} ${pairs(data, k, [[0, 0], [1, 0], [0, 1], [1, 1]])}`)
    else {
      for (let i = 0; i < n; i++) {
        for (let start = 0; start < n; start += n <= 4 ? n : 4) {
          const width = n <= 4 ? n : Math.min(4, n - start)
          const cells = Array.from({ length: width }, (_, c): [number, number] => [i, start + c])
          const text = pairs(data, k, cells)
          lines.push(i === 0 && start === 0 ? `${f} ${text}` : `  ${text}`)
        }
      }
    }
  }
  if (!uniform) lines.push('[End]')
  return `${lines.join('\n')}\n`
}

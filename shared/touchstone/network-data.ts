import { formatQuantity } from '../network/format-quantity'
import { checkedFrequency, type FrequencyBlock } from './data-rows'
import { TouchstoneError } from './error'
import { pairToComplex } from './matrix-cells'
import { toScattering } from './to-scattering'
import { FREQUENCY_UNITS, type MatrixFormat, type OptionLine } from './types'

/** What decoding one file's network data needs to know. */
export interface NetworkLayout {
  ports: number
  options: OptionLine
  /** Cells in the file's order (see matrixCells). */
  cells: ReadonlyArray<readonly [number, number]>
  matrixFormat: MatrixFormat
  /** Port references (Ω) the data is given for and S is referred to. */
  refs: readonly number[]
  /** Y, Z, H, G already divided/multiplied by R (version 1). */
  normalised: boolean
}

/** Decodes frequency blocks into Hz and S in the solver's layout, converting Y, Z, H, G to S. */
export function decodeNetwork(blocks: readonly FrequencyBlock[], layout: NetworkLayout): { frequencies: Float64Array; re: Float64Array; im: Float64Array } {
  const n = layout.ports
  const nn = n * n
  const multiplier = FREQUENCY_UNITS[layout.options.unit]
  const frequencies = new Float64Array(blocks.length)
  const re = new Float64Array(blocks.length * nn)
  const im = new Float64Array(blocks.length * nn)
  const rawRe = new Float64Array(nn), rawIm = new Float64Array(nn)
  const pair: [number, number] = [0, 0]
  const symmetric = layout.matrixFormat !== 'Full'
  for (let k = 0; k < blocks.length; k++) {
    const block = blocks[k]!
    const values = block.values
    const hz = checkedFrequency(values[0]!, multiplier, k > 0 ? frequencies[k - 1] : undefined, block.line)
    frequencies[k] = hz
    for (let c = 0; c < layout.cells.length; c++) {
      const [i, j] = layout.cells[c]!
      pairToComplex(layout.options.format, values[1 + 2 * c]!, values[2 + 2 * c]!, pair)
      rawRe[i * n + j] = pair[0]; rawIm[i * n + j] = pair[1]
      if (symmetric) { rawRe[j * n + i] = pair[0]; rawIm[j * n + i] = pair[1] }
    }
    const outRe = re.subarray(k * nn, (k + 1) * nn), outIm = im.subarray(k * nn, (k + 1) * nn)
    const kind = layout.options.parameter
    if (!toScattering(kind, n, rawRe, rawIm, layout.refs, layout.normalised, outRe, outIm)) {
      throw new TouchstoneError(block.line, `the ${kind}-parameters at ${formatQuantity(hz, 'frequency')} have no S-parameter equivalent at the reference impedances ${layout.refs.map(r => formatQuantity(r, 'impedance')).join(', ')}`)
    }
    for (let x = 0; x < nn; x++) {
      if (!Number.isFinite(outRe[x]!) || !Number.isFinite(outIm[x]!)) throw new TouchstoneError(block.line, `a value at ${formatQuantity(hz, 'frequency')} is too large to use`)
    }
  }
  return { frequencies, re, im }
}

/**
 * `npm run -s bench:touchstone [-- --repeat R]`
 * Times reading a 4-port, 10 001-point Touchstone file (written by our writer, MA format, GHz)
 * after one warm-up and prints one JSON line `{"ports": 4, "points": 10001, "bytes": B, "medianMs": M, "minMs": m}`.
 */
import { parseArgs } from 'node:util'
import { performance } from 'node:perf_hooks'
import { readTouchstone } from '../shared/touchstone/read'
import { writeTouchstone } from '../shared/touchstone/write'

const { values } = parseArgs({ options: { repeat: { type: 'string' } } })
const repeat = Number(values.repeat ?? 10)
const ports = 4
const points = 10_001
const size = points * ports * ports
// Invented, smooth data: a slowly rotating matrix, so the text looks like a measured file's.
const re = new Float64Array(size), im = new Float64Array(size)
for (let x = 0; x < size; x++) {
  re[x] = 0.5 * Math.cos(x * 0.013) * Math.exp(-x / size)
  im[x] = -0.5 * Math.sin(x * 0.013) * Math.exp(-x / size)
}
const frequencies = Float64Array.from({ length: points }, (_, k) => 1e9 + k * 1e5)
const text = writeTouchstone({ ports, impedances: [50, 50, 50, 50], frequencies, re, im }, { format: 'MA', unit: 'GHZ' })

readTouchstone(text, { ports })
const times: number[] = []
for (let r = 0; r < repeat; r++) {
  const start = performance.now()
  readTouchstone(text, { ports })
  times.push(performance.now() - start)
}
times.sort((a, b) => a - b)
const round = (x: number) => Math.round(x * 100) / 100
process.stdout.write(`${JSON.stringify({ ports, points, bytes: text.length, medianMs: round(times[Math.floor(times.length / 2)]!), minMs: round(times[0]!) })}\n`)

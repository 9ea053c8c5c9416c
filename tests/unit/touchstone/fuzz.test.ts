// Hostile input: random mutations of valid files never make the reader throw anything but TouchstoneError,
// and whatever it accepts is finite, with rising frequencies and positive references.
import { describe, expect, it } from 'vitest'
import { TouchstoneError } from '../../../shared/touchstone/error'
import { readTouchstone } from '../../../shared/touchstone/read'
import { writeTouchstone } from '../../../shared/touchstone/write'
import { pick, seededRandom } from '../../support/seeded-random'

const SEEDS: string[] = [
  ['! Quillmere amplifier, bench 3', '# GHZ S MA R 50', '1 0.9 -20 3.1 160 0.05 70 0.5 -40', '2 0.8 -40 2.9 140 0.06 60 0.45 -60', '1.5 0.9 0.6 45 0.4', '2 1.1 0.55 60 0.38'].join('\n'),
  ['[Version] 2.0', '# MHZ Z RI', '[Number of Ports] 3', '[Number of Frequencies] 2', '[Reference] 50', '75 60', '[Matrix Format] Lower', '[Network Data]',
    '100 80 1', '10 0 90 2', '5 1 7 0 70 3', '200 81 1', '11 0 91 2', '6 1 8 0 71 3', '[End]'].join('\n'),
  ['[Version] 2.1', '# HZ H RI R 50', '[Number of Ports] 2', '[Two-Port Data Order] 21_12', '[Number of Frequencies] 1', '[Number of Noise Frequencies] 1',
    '[Begin Information]', 'fixture 9', '[End Information]', '[Network Data]', '1e9 30 0 -1 0 1 0 0.001 0', '[Noise Data]', '1e9 1 0.3 20 25', '[End]'].join('\n'),
  ['# KHZ Y DB R 75', '1 -3 10 -20 5 -20 5 -3 10', '2 -3 11 -20 6 -20 6 -3 11'].join('\n'),
  ['# G RI R 50', '1 0.01 0 -1 0 1 0 0 0'].join('\n'),
  writeTouchstone({ ports: 6, impedances: Array(6).fill(50), frequencies: [1e9, 2e9], re: Array.from({ length: 72 }, (_, i) => Math.sin(i) / 3), im: Array.from({ length: 72 }, (_, i) => Math.cos(i) / 3) }, { format: 'MA' }),
  writeTouchstone({ ports: 4, impedances: [50, 60, 70, 80], frequencies: [1e9, 2e9], re: Array.from({ length: 32 }, (_, i) => Math.sin(i) / 3), im: Array.from({ length: 32 }, (_, i) => Math.cos(i) / 3) }, { version: '2.0', format: 'DB', unit: 'GHZ' }),
]

const PIECES = ['0', '1', '-', '+', '.', 'e', 'E', '9', ' ', '\t', '\n', '\r', '!', '#', '[', ']', 'R', 'S', 'Z', 'µ', '\u0000', 'x', '_']
const WORDS = ['NaN', 'Infinity', '-0', '1e308', '1e999', '0x1f', '', '[End]', '[Network Data]', '[Noise Data]', '[Reference]', '[Version] 2.0', '[Number of Ports] 64',
  '[Number of Frequencies] 100001', '# HZ', 'R 0', '[Matrix Format] Upper', '[Two-Port Data Order] 12_21', '12_21', '-1e-320', '99999999999999999999', '[Begin Information]']

function mutate(text: string, random: () => number): string {
  const lines = text.split('\n')
  const steps = 1 + Math.floor(random() * 3)
  let out = text
  for (let step = 0; step < steps; step++) {
    const at = Math.floor(random() * (out.length + 1))
    switch (Math.floor(random() * 8)) {
      case 0: out = out.slice(0, at) + out.slice(at + 1); break
      case 1: out = out.slice(0, at) + pick(random, PIECES) + out.slice(at); break
      case 2: out = out.slice(0, at) + pick(random, WORDS) + out.slice(at); break
      case 3: { const words = out.split(' '); words[Math.floor(random() * words.length)] = pick(random, WORDS); out = words.join(' '); break }
      case 4: { const l = out.split('\n'); l.splice(Math.floor(random() * l.length), 1); out = l.join('\n'); break }
      case 5: { const l = out.split('\n'); const i = Math.floor(random() * l.length); l.splice(i, 0, l[Math.floor(random() * lines.length)] ?? ''); out = l.join('\n'); break }
      case 6: out = out.slice(0, at); break
      default: { const l = out.split('\n'); const i = Math.floor(random() * l.length), j = Math.floor(random() * l.length); [l[i], l[j]] = [l[j]!, l[i]!]; out = l.join('\n') }
    }
  }
  return out
}

describe('seeded fuzzing of the Touchstone reader', { timeout: 120_000 }, () => {
  it('10 000 mutations of valid files: TouchstoneError or a sane result, nothing else', () => {
    const random = seededRandom(20261202)
    let refused = 0
    let accepted = 0
    for (const seed of SEEDS) expect(() => readTouchstone(seed)).not.toThrow()
    for (let trial = 0; trial < 10_000; trial++) {
      const text = mutate(pick(random, SEEDS), random)
      const ports = random() < 0.3 ? 1 + Math.floor(random() * 6) : undefined
      try {
        const file = readTouchstone(text, { ports })
        accepted++
        expect(file.ports).toBeGreaterThanOrEqual(1)
        expect(file.re.length).toBe(file.frequencies.length * file.ports * file.ports)
        for (let k = 1; k < file.frequencies.length; k++) expect(file.frequencies[k]!).toBeGreaterThan(file.frequencies[k - 1]!)
        for (const z of file.impedances) expect(z).toBeGreaterThan(0)
        for (let x = 0; x < file.re.length; x++) {
          if (!Number.isFinite(file.re[x]!) || !Number.isFinite(file.im[x]!)) throw new Error(`non-finite S accepted from:\n${text}`)
        }
      } catch (error) {
        if (!(error instanceof TouchstoneError)) throw new Error(`${(error as Error).stack}\nfrom input:\n${JSON.stringify(text)}`)
        expect(error.line).toBeGreaterThanOrEqual(1)
        expect(error.reason.length).toBeGreaterThan(0)
        expect(error.reason.length).toBeLessThan(400)
        refused++
      }
    }
    // Both outcomes occur, so the mutations neither all break nor all spare the files.
    expect(refused).toBeGreaterThan(1000)
    expect(accepted).toBeGreaterThan(100)
  })
})

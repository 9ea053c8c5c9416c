import { expect } from 'vitest'
import { TouchstoneError } from '../../../shared/touchstone/error'
import { readTouchstone } from '../../../shared/touchstone/read'
import type { TouchstoneFile } from '../../../shared/touchstone/types'

/** Reads a file given as lines (joined with newlines). */
export const read = (lines: string[], ports?: number): TouchstoneFile => readTouchstone(`${lines.join('\n')}\n`, ports === undefined ? {} : { ports })

/** S(i)(j) (numbered from 1) at frequency index k as [re, im]. */
export const s = (file: TouchstoneFile, k: number, i: number, j: number): [number, number] => {
  const at = (k * file.ports + i - 1) * file.ports + j - 1
  return [file.re[at]!, file.im[at]!]
}

/** Expects a complex value within `tolerance` of [re, im]. */
export const near = (actual: [number, number], expected: [number, number], tolerance = 1e-12): void => {
  expect(Math.hypot(actual[0] - expected[0], actual[1] - expected[1])).toBeLessThan(tolerance)
}

/** The TouchstoneError a read throws (fails the test when it throws nothing or something else). */
export const failure = (lines: string[], ports?: number): TouchstoneError => {
  try {
    read(lines, ports)
  } catch (error) {
    expect(error).toBeInstanceOf(TouchstoneError)
    return error as TouchstoneError
  }
  throw new Error('expected the file to be refused')
}

/** a·e^{jθ°} as [re, im]. */
export const polar = (magnitude: number, degrees: number): [number, number] => [magnitude * Math.cos((degrees * Math.PI) / 180), magnitude * Math.sin((degrees * Math.PI) / 180)]

import { TouchstoneError } from './error'
import { TOUCHSTONE_LIMITS } from './limits'
import { sourceLines } from './lines'
import { readVersion1 } from './read-version1'
import { readVersion2 } from './read-version2'
import type { TouchstoneFile } from './types'

/** Options of `readTouchstone`. */
export interface ReadOptions {
  /** Number of ports, when known from the file name (`.s4p`): checked against the data. */
  ports?: number
}

/**
 * Reads a Touchstone file of version 1.0/1.1 or 2.0/2.1 (S, Y, Z, H or G data in RI, MA or DB)
 * and returns S-parameters referred to each port's reference impedance.
 * Throws `TouchstoneError` (with the line and a reason) for anything the specification does not allow
 * or that is beyond `TOUCHSTONE_LIMITS`; never any other error.
 */
export function readTouchstone(text: string, options: ReadOptions = {}): TouchstoneFile {
  const ports = options.ports
  if (ports !== undefined && !(Number.isInteger(ports) && ports >= 1 && ports <= TOUCHSTONE_LIMITS.ports)) {
    throw new TouchstoneError(1, `the file name gives ${ports} ports; 1 to ${TOUCHSTONE_LIMITS.ports} can be read`)
  }
  const lines = sourceLines(text)
  if (!lines.length) throw new TouchstoneError(1, 'the file has no data (only comments or nothing)')
  return lines[0]!.text.startsWith('[') ? readVersion2(lines, ports) : readVersion1(lines, ports)
}

/** The number of ports a file name gives (`amp.s2p` → 2), or undefined for other names. */
export function portsFromFileName(name: string): number | undefined {
  const match = /\.s(\d{1,4})p$/i.exec(name)
  return match ? Number(match[1]) : undefined
}

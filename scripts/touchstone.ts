/**
 * `npm run -s touchstone -- FILE.sNp`
 * Reads a Touchstone file (1.0/1.1 or 2.x; S, Y, Z, H, G; DB, MA, RI) and prints the same JSON as
 * `solve --format json`: S-parameters referred to each port's reference impedance.
 * A malformed file exits with status 2 and `FILE:LINE: reason` on standard error, nothing on standard output.
 */
import { readFileSync, statSync } from 'node:fs'
import { basename } from 'node:path'
import { TouchstoneError } from '../shared/touchstone/error'
import { TOUCHSTONE_LIMITS } from '../shared/touchstone/limits'
import { portsFromFileName, readTouchstone } from '../shared/touchstone/read'
import { solveResultJsonText } from '../shared/solver/solve-json'
import { endQuietlyWhenOutputCloses, fail } from './network-cli'

function main(): void {
  const args = process.argv.slice(2)
  if (args.length !== 1 || args[0]!.startsWith('-')) fail(['usage: npm run -s touchstone -- FILE.sNp'])
  const path = args[0]!
  let text: string
  try {
    // Checked before reading so that a huge file is refused without filling memory.
    if (statSync(path).size > TOUCHSTONE_LIMITS.characters) fail([`${path}:1: the file is larger than ${TOUCHSTONE_LIMITS.characters / 1024 / 1024} MiB`])
    text = readFileSync(path, 'latin1')
  } catch (error) {
    fail([`${path}: cannot be read (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`])
  }
  try {
    const file = readTouchstone(text, { ports: portsFromFileName(basename(path)) })
    process.stdout.write(`${solveResultJsonText(file)}\n`)
  } catch (error) {
    if (error instanceof TouchstoneError) fail([`${path}:${error.line}: ${error.reason}`])
    throw error
  }
}

endQuietlyWhenOutputCloses()
main()

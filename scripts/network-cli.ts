/**
 * What the command-line tools share: reading a document, loading its
 * subnetworks relative to the file that names them, sweep overrides and problem output.
 */
import { existsSync, readFileSync, statSync } from 'node:fs'
import { basename, dirname, resolve } from 'node:path'
import { evaluateQuantity } from '../shared/network/expression'
import type { QuantityKind } from '../shared/network/quantities'
import type { Problem } from '../shared/network/types'
import type { DataResolver, DataSet, PrepareOptions, SubnetworkResolver, SweepSettings } from '../shared/solver/index'
import { TOUCHSTONE_LIMITS } from '../shared/touchstone/limits'
import { portsFromFileName, readTouchstone } from '../shared/touchstone/read'

/**
 * A reader that stops early (`… | head`) closes the pipe: the command then ends
 * quietly with status 0, as it has nothing more to say to anyone, instead of
 * dying on an unhandled EPIPE with a stack trace.
 */
export function endQuietlyWhenOutputCloses(): void {
  process.stdout.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE') process.exit(0)
    throw error
  })
}

/** Prints one line per problem on standard error and exits with status 2; nothing goes to standard output. */
export function fail(problems: Array<Problem | string>): never {
  for (const problem of problems) process.stderr.write(`${typeof problem === 'string' ? problem : problem.message}\n`)
  process.exit(2)
}

/** Reads a JSON document, or fails with a one-line reason. */
export function readDocument(path: string): unknown {
  let text: string
  try {
    text = readFileSync(path, 'utf8')
  } catch (error) {
    fail([`${path}: cannot be read (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`])
  }
  try {
    return JSON.parse(text)
  } catch (error) {
    fail([`${path}: not valid JSON (${(error as Error).message})`])
  }
}

function locate(from: string, ref: string): string {
  const path = resolve(dirname(from), ref)
  return existsSync(path) || path.endsWith('.json') ? path : `${path}.json`
}

/** Loads subnetwork documents as files, each reference relative to the document that names it. */
export function fileResolver(documentPath: string): SubnetworkResolver {
  return (ref, trail) => {
    let from = resolve(documentPath)
    for (const step of trail) from = locate(from, step)
    const path = locate(from, ref)
    const text = readFileSync(path, 'utf8')
    return JSON.parse(text)
  }
}

/**
 * Loads the Touchstone files of `data` blocks, each path relative to the folder of the document
 * that holds the block; a file used by several blocks is read once.
 */
export function dataFileResolver(documentPath: string): DataResolver {
  const read = new Map<string, DataSet>()
  return (ref, trail) => {
    let from = resolve(documentPath)
    for (const step of trail) from = locate(from, step)
    const path = resolve(dirname(from), ref)
    const known = read.get(path)
    if (known) return known
    if (statSync(path).size > TOUCHSTONE_LIMITS.characters) throw new Error(`${ref} is larger than ${TOUCHSTONE_LIMITS.characters / 1024 / 1024} MiB`)
    const data = readTouchstone(readFileSync(path, 'latin1'), { ports: portsFromFileName(basename(path)) })
    read.set(path, data)
    return data
  }
}

/** How every command prepares a document read from a file: what it refers to is loaded relative to that file. */
export function cliPrepareOptions(documentPath: string): PrepareOptions {
  return { resolveSubnetwork: fileResolver(documentPath), resolveData: dataFileResolver(documentPath) }
}

/** Turns --start/--stop/--points/--spacing into a sweep override, or fails naming the option. */
export function sweepOverride(values: { start?: string; stop?: string; points?: string; spacing?: string }): Partial<SweepSettings> {
  const override: Partial<SweepSettings> = {}
  const problems: string[] = []
  for (const field of ['start', 'stop'] as const) {
    const text = values[field]
    if (text === undefined) continue
    const numeric = Number(text)
    const outcome = evaluateQuantity(Number.isFinite(numeric) && text.trim() !== '' ? numeric : text, 'frequency', new Map())
    if (outcome.ok) override[field] = outcome.value
    else problems.push(`--${field}: ${outcome.error}`)
  }
  if (values.points !== undefined) {
    const points = Number(values.points)
    if (Number.isInteger(points) && points >= 1) override.points = points
    else problems.push(`--points: must be a whole number of at least 1 (got "${values.points}")`)
  }
  if (values.spacing !== undefined) {
    if (values.spacing === 'linear' || values.spacing === 'log') override.spacing = values.spacing
    else problems.push(`--spacing: must be linear or log (got "${values.spacing}")`)
  }
  if (problems.length) fail(problems)
  return override
}

/** Reads one command-line value as a quantity (a number in SI or text with units, "0.508 mm"); an error names the option. */
export function quantityOption(option: string, text: string, kind: QuantityKind): { ok: true; value: number } | { ok: false; error: string } {
  const numeric = Number(text)
  const outcome = evaluateQuantity(Number.isFinite(numeric) && text.trim() !== '' ? numeric : text, kind, new Map())
  return outcome.ok ? outcome : { ok: false, error: `--${option}: ${outcome.error}` }
}

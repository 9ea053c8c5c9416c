import type { Problem } from '../network/types'
import { TouchstoneError } from '../touchstone/error'
import type { DataResolver } from './prepare'
import type { DataSet } from './types'

/** Calls the caller's data resolver and checks what it returns, so a bad data set is a problem, never a crash. */
export function resolveDataSet(ref: string, resolver: DataResolver | undefined, trail: readonly string[]): { ok: true; data: DataSet } | { ok: false; problems: Problem[] } {
  if (!resolver) return { ok: false, problems: [{ message: `data set "${ref}" cannot be loaded here (no data loader was given)` }] }
  let data: DataSet | undefined
  try {
    data = resolver(ref, trail)
  } catch (error) {
    const reason = error instanceof TouchstoneError ? `line ${error.line}: ${error.reason}` : (error as Error).message
    return { ok: false, problems: [{ message: `data set "${ref}" could not be read: ${reason}` }] }
  }
  if (data === undefined || data === null) return { ok: false, problems: [{ message: `data set "${ref}" was not found` }] }
  const shape = shapeProblem(data)
  return shape ? { ok: false, problems: [{ message: `data set "${ref}" ${shape}` }] } : { ok: true, data }
}

function shapeProblem(data: DataSet): string | undefined {
  const n = data.ports
  if (!Number.isInteger(n) || n < 1) return 'has no ports'
  const count = data.frequencies?.length ?? 0
  if (count < 1) return 'has no frequencies'
  if (data.impedances?.length !== n || !data.impedances.every(z => Number.isFinite(z) && z > 0)) return 'needs one positive reference impedance per port'
  if (data.re?.length !== count * n * n || data.im?.length !== count * n * n) return 'has the wrong number of values for its ports and frequencies'
  for (let x = 0; x < count * n * n; x++) if (!Number.isFinite(data.re[x]!) || !Number.isFinite(data.im[x]!)) return 'has a value that is not a finite number'
  if (!Number.isFinite(data.frequencies[0]!) || data.frequencies[0]! < 0) return 'has a frequency that is not a finite, non-negative number'
  for (let k = 1; k < count; k++) if (!(data.frequencies[k]! > data.frequencies[k - 1]!)) return 'has frequencies that do not increase'
  return undefined
}

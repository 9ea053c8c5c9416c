/**
 * Worker-thread entry for server-side solves (bundled on its own into the built server, see nuxt.config.ts):
 * a snapshot summary of a document with its project's networks for subnetworks. Runs inside the solve pool's
 * time and memory budget, never on the event loop that answers every team.
 */
import { snapshotSummary, type SnapshotSummary } from '#shared/review/snapshot-summary'
import type { DataSet } from '#shared/solver/types'
import { portsFromFileName, readTouchstone } from '#shared/touchstone/read'

/** What one solve needs: the document, the project's networks by id and by name, and its data files by name (as text). */
export interface SummaryTask {
  document: unknown
  networks: Array<[string, unknown]>
  files?: Array<[string, string]>
}

export default function summarise(task: SummaryTask): SnapshotSummary {
  const byRef = new Map(task.networks)
  const files = new Map(task.files ?? [])
  // Files are read here, inside the pool's budget, and once each however many blocks use them.
  const read = new Map<string, DataSet>()
  const resolveData = (name: string): DataSet | undefined => {
    const text = files.get(name)
    if (text === undefined) return undefined
    let data = read.get(name)
    if (!data) read.set(name, data = readTouchstone(text, { ports: portsFromFileName(name) }))
    return data
  }
  return snapshotSummary(task.document as Parameters<typeof snapshotSummary>[0], { resolveSubnetwork: ref => byRef.get(ref), resolveData })
}

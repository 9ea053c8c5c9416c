/**
 * Worker-thread entry for server-side solves (bundled on its own into the built server, see nuxt.config.ts):
 * a snapshot summary of a document with its project's networks for subnetworks. Runs inside the solve pool's
 * time and memory budget, never on the event loop that answers every team.
 */
import { snapshotSummary, type SnapshotSummary } from '../../shared/review/snapshot-summary'

/** What one solve needs: the document and the project's networks by id and by name. */
export interface SummaryTask {
  document: unknown
  networks: Array<[string, unknown]>
}

export default function summarise(task: SummaryTask): SnapshotSummary {
  const byRef = new Map(task.networks)
  return snapshotSummary(task.document as Parameters<typeof snapshotSummary>[0], { resolveSubnetwork: ref => byRef.get(ref) })
}

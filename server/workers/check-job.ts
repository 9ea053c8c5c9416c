/**
 * Worker-thread entry (bundled on its own into the built server, see nuxt.config.ts): checks a run before it is
 * queued with the very preparation every chunk makes — data files read, subnetworks resolved, the nominal design
 * solved — inside the solve pool's time and memory budget rather than on the event loop.
 */
import { checkJob, type JobCheckTask } from '../jobs/run-chunk'

export type { JobCheckTask }

export default function check(task: JobCheckTask): string[] {
  return checkJob(task)
}

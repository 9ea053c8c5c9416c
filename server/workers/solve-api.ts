/**
 * Worker-thread entry for solves asked through the automation API (bundled on its own into the built server,
 * see nuxt.config.ts): the contract's JSON of a document, with its project's networks for subnetworks. Runs
 * inside the solve pool's time and memory budget; the answer's text is written here, off the event loop.
 */
import { solveForApi, type ApiSolveOutcome, type ApiSolveTask } from '#shared/automation/api-solve'

export type { ApiSolveTask }

export default function solve(task: ApiSolveTask): ApiSolveOutcome {
  return solveForApi(task)
}

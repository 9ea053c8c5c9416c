import { Network } from '~~/server/database/models'
import { apiSolveSchema } from '#shared/schemas/access-token'
import { SAFETY_NOTE } from '#shared/solver/safety-note'

/**
 * Solves a network for a script (bearer token only): a document sent in the body, or a stored network the token
 * may read. Answers the contract's JSON (`solve --format json`) or 422 with `problems` in plain words. Runs in
 * the solve pool within its time and memory budget, at most PORTWRIGHT_API_SOLVE_LIMIT solves a minute per token.
 */
export default defineEventHandler(async (event) => {
  const access = await requireToken(event)
  await reserveApiSolve(event, access.token.id)
  const body = await readBodyAs(event, apiSolveSchema)
  const projectId = body.project
  let document: unknown = 'document' in body ? body.document : undefined
  if (projectId) await requireTokenProjectRole(access, projectId, 'viewer')
  if ('network' in body) {
    const stored = await Network.findOne({ where: { id: body.network, projectId: body.project }, attributes: ['document'] })
    if (!stored) throw createError({ statusCode: 404, message: 'Network not found in that project.' })
    document = stored.document
  }
  // Subnetworks resolve from the same project's networks, by id or by name, as the editor and snapshots do.
  const networks = projectId ? await projectNetworksByRef(projectId) : []
  const outcome = await solveApiInPool({ document, networks, ...(body.sweep ? { sweep: body.sweep } : {}) }).catch((error: unknown) => {
    // Past the time or memory budget the pool answers 422 too; scripts get the same shape either way.
    if (isError(error) && error.statusCode === 422) return { ok: false as const, problems: [error.message] }
    throw error
  })
  if (!outcome.ok) {
    setResponseStatus(event, 422)
    return { statusCode: 422, message: `The network cannot be solved: ${outcome.problems[0]}`, problems: outcome.problems }
  }
  setResponseHeader(event, 'Content-Type', 'application/json; charset=utf-8')
  // The contract fixes the body's keys, so the caution every exported result carries travels as a header.
  setResponseHeader(event, 'Portwright-Caution', SAFETY_NOTE)
  return outcome.json
})

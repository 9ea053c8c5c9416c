/** Liveness and database reachability, for the start script and monitoring. Public by design. */
export default defineEventHandler(async (event) => {
  try {
    await useDatabase().query('SELECT 1')
    return { status: 'ok', database: 'ok' }
  } catch {
    setResponseStatus(event, 503)
    return { status: 'degraded', database: 'unreachable' }
  }
})

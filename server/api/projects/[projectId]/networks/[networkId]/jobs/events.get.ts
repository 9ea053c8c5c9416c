import { z } from 'zod'
import { Job, Membership } from '~~/server/database/models'

/** Streams a user may hold open at once (every open editor tab holds one). */
const MAX_STREAMS_PER_USER = 20
const openStreams = new Map<string, number>()

const eventsQuery = z.object({
  // How long the stream stays open; the browser reconnects after it ends, which runs the gate again.
  seconds: z.coerce.number().int().min(1).max(600).default(300),
})

/**
 * The network's runs as server-sent events (any member): `runs` with the whole list on opening (and after the
 * server may have missed notices), then `run` with one run each time a queue worker or a member changes it
 * (started, a part finished, done, failed, cancelled). Workers announce changes with PostgreSQL NOTIFY; the
 * membership is checked again before each push, so a member removed stops hearing within one change.
 */
export default defineEventHandler(async (event) => {
  const { user, project } = await requireProjectRole(event, 'viewer')
  const network = await requireNetwork(event, project.id)
  const { seconds } = queryAs(event, eventsQuery)
  const open = openStreams.get(user.id) ?? 0
  if (open >= MAX_STREAMS_PER_USER) {
    throw createError({ statusCode: 429, message: `You are following runs in ${open} tabs or windows already; close some and reload.` })
  }
  openStreams.set(user.id, open + 1)

  const stream = createEventStream(event)
  const pending = new Set<string>()
  let everything = true
  let flushing: ReturnType<typeof setTimeout> | undefined
  let closed = false

  const stillMember = async () => !!(await Membership.findOne({ where: { projectId: project.id, userId: user.id }, attributes: ['userId'] }))
  const flush = async () => {
    flushing = undefined
    if (closed) return
    if (!(await stillMember())) {
      await stream.close()
      return
    }
    if (everything) {
      everything = false
      pending.clear()
      const jobs = await Job.findAll({ where: { networkId: network.id }, attributes: { exclude: ['document'] }, order: [['createdAt', 'DESC']], limit: 50 })
      await stream.push({ event: 'runs', data: JSON.stringify(jobs.map(toJobDto)) })
      return
    }
    const ids = [...pending]
    pending.clear()
    const jobs = await Job.findAll({ where: { id: ids, networkId: network.id }, attributes: { exclude: ['document'] } })
    for (const job of jobs) await stream.push({ event: 'run', data: JSON.stringify(toJobDto(job)) })
  }
  // Notices arriving close together (several workers finishing parts) become one read and one push.
  const schedule = () => {
    if (!flushing && !closed) flushing = setTimeout(() => { flush().catch(error => console.warn(`[jobs] progress push failed: ${(error as Error).message}`)) }, 150)
  }
  const unfollow = followJobProgress(network.id, (jobId) => {
    if (jobId === null) everything = true
    else pending.add(jobId)
    schedule()
  })
  const lifetime = setTimeout(() => { void stream.close() }, seconds * 1000)
  stream.onClosed(() => {
    if (closed) return
    closed = true
    unfollow()
    clearTimeout(lifetime)
    clearTimeout(flushing)
    const left = (openStreams.get(user.id) ?? 1) - 1
    if (left > 0) openStreams.set(user.id, left)
    else openStreams.delete(user.id)
  })
  schedule()
  return stream.send()
})

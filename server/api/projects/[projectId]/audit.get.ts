import { z } from 'zod'
import { Op } from 'sequelize'
import { AuditEvent } from '~~/server/database/models'
import type { AuditEventDto } from '#shared/types/review'

const auditQuery = z.object({
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(100),
})

/** The project's audit trail, newest first, paged by `before` (an event id) (owners). */
export default defineEventHandler(async (event): Promise<AuditEventDto[]> => {
  const { project } = await requireProjectRole(event, 'owner')
  const query = queryAs(event, auditQuery)
  const events = await AuditEvent.findAll({
    where: { projectId: project.id, ...(query.before ? { id: { [Op.lt]: query.before } } : {}) },
    order: [['id', 'DESC']],
    limit: query.limit,
  })
  const subjectOf = (e: AuditEvent) => (typeof e.detail.userId === 'string' ? e.detail.userId : null)
  const people = await peopleById(events.flatMap(e => [e.actorId, subjectOf(e)]))
  return events.map(e => ({
    id: Number(e.id),
    action: e.action,
    actor: e.actorId ? people.get(e.actorId) ?? null : null,
    subject: subjectOf(e) ? people.get(subjectOf(e)!) ?? null : null,
    detail: e.detail,
    createdAt: e.createdAt.toISOString(),
  }))
})

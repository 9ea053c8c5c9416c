import { AuditEvent } from '~~/server/database/models'

/** Appends an audit event; never throws into the caller's request. */
export async function recordAudit(action: string, actorId: string | null, projectId: string | null, detail: Record<string, unknown> = {}): Promise<void> {
  useDatabase()
  await AuditEvent.create({ action, actorId, projectId, detail })
}

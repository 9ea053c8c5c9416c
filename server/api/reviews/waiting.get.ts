import { QueryTypes } from 'sequelize'
import type { WaitingReviewDto } from '#shared/types/waiting-review'

/**
 * The reviews, across every project, that wait for the signed-in member's own decision:
 * still awaiting, the member one of its reviewers with no decision yet, and still able
 * to decide there (reviewer role or higher). Oldest request first.
 */
export default defineEventHandler(async (event): Promise<WaitingReviewDto[]> => {
  const user = await requireCurrentUser(event)
  const rows = await useDatabase().query<{
    review_id: string, project_id: string, project_name: string, network_id: string, network_name: string
    snapshot_id: string, snapshot_title: string, requested_by: string | null, message: string, created_at: Date
  }>(
    `SELECT r.id AS review_id, p.id AS project_id, p.name AS project_name, n.id AS network_id, n.name AS network_name,
            s.id AS snapshot_id, s.title AS snapshot_title, r.requested_by, r.message, r.created_at
       FROM review_reviewers rr
       JOIN reviews r ON r.id = rr.review_id AND r.state = 'awaiting'
       JOIN snapshots s ON s.id = r.snapshot_id
       JOIN networks n ON n.id = s.network_id AND n.project_id = r.project_id
       JOIN projects p ON p.id = r.project_id
       JOIN memberships m ON m.project_id = p.id AND m.user_id = rr.user_id AND m.role IN ('owner', 'editor', 'reviewer')
      WHERE rr.user_id = $1 AND rr.decision IS NULL
      ORDER BY r.created_at ASC
      LIMIT 200`,
    { bind: [user.id], type: QueryTypes.SELECT },
  )
  const people = await peopleById(rows.map(r => r.requested_by))
  return rows.map(r => ({
    reviewId: r.review_id,
    projectId: r.project_id,
    projectName: r.project_name,
    networkId: r.network_id,
    networkName: r.network_name,
    snapshotId: r.snapshot_id,
    snapshotTitle: r.snapshot_title,
    requestedBy: r.requested_by ? people.get(r.requested_by) ?? null : null,
    message: r.message,
    createdAt: new Date(r.created_at).toISOString(),
  }))
})

import { Review } from '~~/server/database/models'
import type { ReviewDto } from '#shared/types/review'

/** The snapshot's reviews, newest first, with reviewers, decisions and history (any member). */
export default defineEventHandler(async (event): Promise<ReviewDto[]> => {
  const { project } = await requireProjectRole(event, 'viewer')
  const { snapshot } = await requireSnapshot(event, project.id)
  const reviews = await Review.findAll({ where: { snapshotId: snapshot.id }, order: [['createdAt', 'DESC']] })
  return toReviewDtos(reviews)
})

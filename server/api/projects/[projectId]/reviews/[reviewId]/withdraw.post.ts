import { withdrawReviewSchema } from '#shared/schemas/review'
import { Review, ReviewEvent } from '~~/server/database/models'
import type { ReviewDto } from '#shared/types/review'

/** Withdraws a review that is still awaiting decisions (owners and editors). */
export default defineEventHandler(async (event): Promise<ReviewDto> => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const body = await readBodyAs(event, withdrawReviewSchema)
  const found = await requireReview(event, project.id)
  const review = await useDatabase().transaction(async (transaction) => {
    const locked = (await Review.findByPk(found.id, { transaction, lock: transaction.LOCK.UPDATE }))!
    if (locked.state !== 'awaiting') throw createError({ statusCode: 409, message: `Only a review awaiting decisions can be withdrawn; this one is ${locked.state}.` })
    await locked.update({ state: 'withdrawn', closedAt: new Date() }, { transaction })
    await ReviewEvent.create({ reviewId: locked.id, actorId: user.id, kind: 'withdrawn', note: body.note }, { transaction })
    return locked
  })
  await recordAudit('review.withdrawn', user.id, project.id, { reviewId: review.id, snapshotId: review.snapshotId })
  return (await toReviewDtos([review]))[0]!
})

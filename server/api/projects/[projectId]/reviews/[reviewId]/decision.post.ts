import { decideReviewSchema } from '#shared/schemas/review'
import { Review, ReviewEvent, ReviewReviewer, Snapshot, Network } from '~~/server/database/models'
import { decisionMail } from '~~/server/mail/messages'
import type { ReviewDto, ReviewState } from '#shared/types/review'

/**
 * A reviewer's decision on a review they were asked for (reviewers and up). One "send
 * back" settles the review as sent back; when every reviewer has cleared it, it is
 * cleared. The requester and the other reviewers get an e-mail.
 */
export default defineEventHandler(async (event): Promise<ReviewDto> => {
  const { user, project } = await requireProjectRole(event, 'reviewer')
  const body = await readBodyAs(event, decideReviewSchema)
  const found = await requireReview(event, project.id)
  const review = await useDatabase().transaction(async (transaction) => {
    const locked = (await Review.findByPk(found.id, { transaction, lock: transaction.LOCK.UPDATE }))!
    const reviewers = await ReviewReviewer.findAll({ where: { reviewId: locked.id }, transaction })
    const mine = reviewers.find(r => r.userId === user.id)
    if (!mine) throw createError({ statusCode: 403, message: 'You were not asked to review this; only the chosen reviewers decide.' })
    if (locked.state !== 'awaiting') throw createError({ statusCode: 409, message: `This review is already settled (${locked.state}); ask for a new review to decide again.` })
    if (mine.decision) throw createError({ statusCode: 409, message: `You already decided on this review (${mine.decision}).` })
    await mine.update({ decision: body.decision, note: body.note, decidedAt: new Date() }, { transaction })
    await ReviewEvent.create({ reviewId: locked.id, actorId: user.id, kind: body.decision, note: body.note }, { transaction })
    const state: ReviewState = body.decision === 'send-back'
      ? 'sent-back'
      : reviewers.every(r => r.userId === user.id || r.decision === 'clear') ? 'cleared' : 'awaiting'
    if (state !== 'awaiting') await locked.update({ state, closedAt: new Date() }, { transaction })
    return { locked, state, others: reviewers.filter(r => r.userId !== user.id).map(r => r.userId) }
  })
  const snapshot = (await Snapshot.findByPk(review.locked.snapshotId, { attributes: ['id', 'title', 'networkId'] }))!
  await recordAudit('review.decided', user.id, project.id, { reviewId: review.locked.id, snapshotId: snapshot.id, title: snapshot.title, decision: body.decision, state: review.state })
  const recipients = [...new Set([review.locked.requestedBy, ...review.others].filter((id): id is string => !!id && id !== user.id))]
  const people = await peopleById(recipients)
  const network = await Network.findByPk(snapshot.networkId, { attributes: ['id'] })
  const url = appLink(event, appPaths.snapshot(project.id, network!.id, snapshot.id))
  for (const id of recipients) {
    const person = people.get(id)
    if (!person) continue
    await sendMail(person.email, decisionMail({
      deciderName: user.name, decision: body.decision, note: body.note, snapshotTitle: snapshot.title, projectName: project.name, state: review.state, url,
    }))
  }
  return (await toReviewDtos([review.locked]))[0]!
})

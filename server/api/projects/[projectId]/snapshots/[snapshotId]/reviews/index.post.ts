import { requestReviewSchema } from '#shared/schemas/review'
import { roleAtLeast } from '~~/server/utils/project-access'
import { Membership, Review, ReviewEvent, ReviewReviewer } from '~~/server/database/models'
import { reviewRequestedMail } from '~~/server/mail/messages'
import { summaryLines } from '#shared/review/summary-lines'
import type { ReviewDto, SnapshotSummary } from '#shared/types/review'

/**
 * Asks chosen members to review a snapshot (owners and editors). Each must hold the
 * reviewer role or higher; each gets an e-mail with the snapshot's key figures. With
 * `allowUnsolved: false`, a snapshot that does not solve answers 422 naming its problem.
 */
export default defineEventHandler(async (event): Promise<ReviewDto> => {
  const { user, project } = await requireProjectRole(event, 'editor')
  const body = await readBodyAs(event, requestReviewSchema)
  const { snapshot, network } = await requireSnapshot(event, project.id)
  const reviewerIds = [...new Set(body.reviewerIds)]
  const snapshotSummary = snapshot.summary as unknown as SnapshotSummary
  if (!snapshotSummary.solved && !body.allowUnsolved) throw unsolvedRefusal('snapshot', snapshotSummary.problem)
  if (reviewerIds.includes(user.id)) {
    throw createError({ statusCode: 400, message: 'Ask someone else: you cannot review your own request.', data: { fields: { reviewerIds: 'You are the requester.' } } })
  }
  const memberships = await Membership.findAll({ where: { projectId: project.id, userId: reviewerIds } })
  const people = await peopleById(reviewerIds)
  for (const id of reviewerIds) {
    const membership = memberships.find(m => m.userId === id)
    if (!membership) throw createError({ statusCode: 400, message: `${id} is not a member of this project.`, data: { fields: { reviewerIds: 'Not a member.' } } })
    if (!roleAtLeast(membership.role, 'reviewer')) {
      throw createError({ statusCode: 400, message: `${people.get(id)?.name ?? id} is a ${membership.role} and cannot decide on reviews; make them a reviewer first.`, data: { fields: { reviewerIds: 'Needs the reviewer role.' } } })
    }
  }
  const review = await useDatabase().transaction(async (transaction) => {
    // Locking the snapshot row serialises two requests for the same snapshot.
    await useDatabase().query('SELECT id FROM snapshots WHERE id = :id FOR UPDATE', { replacements: { id: snapshot.id }, transaction })
    const open = await Review.findOne({ where: { snapshotId: snapshot.id, state: 'awaiting' }, transaction })
    if (open) throw createError({ statusCode: 409, message: 'This snapshot already has a review awaiting decisions; withdraw it before asking again.' })
    const created = await Review.create({ projectId: project.id, snapshotId: snapshot.id, requestedBy: user.id, message: body.message }, { transaction })
    await ReviewReviewer.bulkCreate(reviewerIds.map(userId => ({ reviewId: created.id, userId })), { transaction })
    await ReviewEvent.create({ reviewId: created.id, actorId: user.id, kind: 'requested', note: body.message }, { transaction })
    return created
  })
  await recordAudit('review.requested', user.id, project.id, { reviewId: review.id, snapshotId: snapshot.id, title: snapshot.title, reviewerIds, ...unsolvedDetail(snapshotSummary) })
  const url = appLink(event, appPaths.snapshot(project.id, network.id, snapshot.id))
  const summary = summaryLines(snapshot.summary as unknown as SnapshotSummary)
  for (const id of reviewerIds) {
    await sendMail(people.get(id)!.email, reviewRequestedMail({
      requesterName: user.name, projectName: project.name, networkName: network.name, snapshotTitle: snapshot.title, message: body.message, summary, url,
    }))
  }
  setResponseStatus(event, 201)
  return (await toReviewDtos([review]))[0]!
})

import { Network, Review, Snapshot } from '~~/server/database/models'
import type { ProjectReviewDto } from '#shared/types/review'

/** The project's reviews, newest first, with their snapshot and network (any member). */
export default defineEventHandler(async (event): Promise<ProjectReviewDto[]> => {
  const { project } = await requireProjectRole(event, 'viewer')
  const reviews = await Review.findAll({ where: { projectId: project.id }, order: [['createdAt', 'DESC']], limit: 100 })
  const snapshots = await Snapshot.findAll({ where: { id: reviews.map(r => r.snapshotId) }, attributes: ['id', 'title', 'networkId'] })
  const networks = await Network.findAll({ where: { id: snapshots.map(s => s.networkId) }, attributes: ['id', 'name'] })
  const dtos = await toReviewDtos(reviews)
  return dtos.map((review) => {
    const snapshot = snapshots.find(s => s.id === review.snapshotId)!
    const network = networks.find(n => n.id === snapshot.networkId)!
    return { ...review, snapshotTitle: snapshot.title, networkId: network.id, networkName: network.name }
  })
})

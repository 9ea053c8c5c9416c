import type { PersonDto } from './review'

/** A review the signed-in member has been asked to decide and has not yet. */
export interface WaitingReviewDto {
  reviewId: string
  projectId: string
  projectName: string
  networkId: string
  networkName: string
  snapshotId: string
  snapshotTitle: string
  requestedBy: PersonDto | null
  message: string
  createdAt: string
}

import type { Sequelize } from 'sequelize'
import { User } from './User'
import { Project } from './Project'
import { Membership } from './Membership'
import { Network } from './Network'
import { Snapshot } from './Snapshot'
import { Comment } from './Comment'
import { StoredFile } from './StoredFile'
import { AuditEvent } from './AuditEvent'
import { Invitation } from './Invitation'
import { Review } from './Review'
import { ReviewReviewer } from './ReviewReviewer'
import { ReviewEvent } from './ReviewEvent'
import { OutboxMessage } from './OutboxMessage'
import { NetworkLiveState } from './NetworkLiveState'
import { NetworkUpdate } from './NetworkUpdate'
import { AccountSession } from './AccountSession'
import { PasswordReset } from './PasswordReset'
import { AccessToken } from './AccessToken'
import { AccessTokenProject } from './AccessTokenProject'
import { NetworkCheckpoint } from './NetworkCheckpoint'
import { Job } from './Job'
import { JobChunk } from './JobChunk'
import { ProjectSubstrate } from './ProjectSubstrate'
import { SnapshotFile } from './SnapshotFile'

export { User, Project, Membership, Network, Snapshot, Comment, StoredFile, AuditEvent }
export { Invitation, Review, ReviewReviewer, ReviewEvent, OutboxMessage }
export { NetworkLiveState, NetworkUpdate }
export { AccountSession, PasswordReset }
export { AccessToken, AccessTokenProject }
export { NetworkCheckpoint }
export { Job, JobChunk }
export { ProjectSubstrate }
export { SnapshotFile }

/** Binds every model to one Sequelize instance. */
export function setupModels(sequelize: Sequelize): void {
  for (const model of [User, Project, Membership, Network, Snapshot, Comment, StoredFile, AuditEvent]) {
    model.setup(sequelize)
  }
  for (const model of [Invitation, Review, ReviewReviewer, ReviewEvent, OutboxMessage]) model.setup(sequelize)
  for (const model of [NetworkLiveState, NetworkUpdate]) model.setup(sequelize)
  for (const model of [AccountSession, PasswordReset]) model.setup(sequelize)
  for (const model of [AccessToken, AccessTokenProject]) model.setup(sequelize)
  NetworkCheckpoint.setup(sequelize)
  for (const model of [Job, JobChunk]) model.setup(sequelize)
  ProjectSubstrate.setup(sequelize)
  SnapshotFile.setup(sequelize)
}

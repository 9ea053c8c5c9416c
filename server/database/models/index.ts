import type { Sequelize } from 'sequelize'
import { User } from './User'
import { Project } from './Project'
import { Membership } from './Membership'
import { Network } from './Network'
import { Snapshot } from './Snapshot'
import { Comment } from './Comment'
import { StoredFile } from './StoredFile'
import { AuditEvent } from './AuditEvent'

export { User, Project, Membership, Network, Snapshot, Comment, StoredFile, AuditEvent }

/** Binds every model to one Sequelize instance. */
export function setupModels(sequelize: Sequelize): void {
  for (const model of [User, Project, Membership, Network, Snapshot, Comment, StoredFile, AuditEvent]) {
    model.setup(sequelize)
  }
}

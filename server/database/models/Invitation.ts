import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { ProjectRole } from '../../../shared/types/api'

/** An e-mailed invitation to join a project; the link's token is kept only as a hash and works once. */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<string>
  declare projectId: string
  declare email: string
  declare role: ProjectRole
  declare tokenHash: string
  declare invitedBy: string | null
  declare expiresAt: Date
  declare acceptedAt: CreationOptional<Date | null>
  declare acceptedBy: CreationOptional<string | null>
  declare revokedAt: CreationOptional<Date | null>
  declare createdAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    Invitation.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false },
      role: { type: DataTypes.STRING(16), allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      invitedBy: { type: DataTypes.UUID, allowNull: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acceptedAt: { type: DataTypes.DATE, allowNull: true },
      acceptedBy: { type: DataTypes.UUID, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    }, { sequelize, tableName: 'invitations', underscored: true, updatedAt: false })
  }
}

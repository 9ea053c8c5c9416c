import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { TokenRoleCeiling } from '../../../shared/types/access-token'

/** A personal access token for the automation API; the secret itself is never stored, only its SHA-256. */
export class AccessToken extends Model<InferAttributes<AccessToken>, InferCreationAttributes<AccessToken>> {
  declare id: CreationOptional<string>
  declare userId: string
  declare name: string
  declare tokenHash: string
  declare hint: string
  declare roleCeiling: TokenRoleCeiling
  declare expiresAt: Date
  declare lastUsedAt: CreationOptional<Date | null>
  declare createdAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    AccessToken.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      userId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(80), allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      hint: { type: DataTypes.STRING(16), allowNull: false },
      roleCeiling: { type: DataTypes.STRING(16), allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      lastUsedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    }, { sequelize, tableName: 'access_tokens', underscored: true, updatedAt: false })
  }
}

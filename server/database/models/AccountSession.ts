import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One signed-in browser: the cookie holds a secret whose SHA-256 is `tokenHash`; revoking the row ends the session. */
export class AccountSession extends Model<InferAttributes<AccountSession>, InferCreationAttributes<AccountSession>> {
  declare id: CreationOptional<string>
  declare userId: string
  declare tokenHash: string
  declare userAgent: string
  declare createdAt: CreationOptional<Date>
  declare lastSeenAt: CreationOptional<Date>
  declare revokedAt: CreationOptional<Date | null>

  static setup(sequelize: Sequelize) {
    AccountSession.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      userId: { type: DataTypes.UUID, allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      userAgent: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
      createdAt: DataTypes.DATE,
      lastSeenAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
    }, { sequelize, tableName: 'sessions', underscored: true, updatedAt: false })
  }
}

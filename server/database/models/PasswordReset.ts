import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** A mailed password-reset link: only the token's SHA-256 is kept; it works once, until `expiresAt`. */
export class PasswordReset extends Model<InferAttributes<PasswordReset>, InferCreationAttributes<PasswordReset>> {
  declare id: CreationOptional<string>
  declare userId: string
  declare tokenHash: string
  declare createdAt: CreationOptional<Date>
  declare expiresAt: Date
  declare usedAt: CreationOptional<Date | null>

  static setup(sequelize: Sequelize) {
    PasswordReset.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      userId: { type: DataTypes.UUID, allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      createdAt: DataTypes.DATE,
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
    }, { sequelize, tableName: 'password_resets', underscored: true, updatedAt: false })
  }
}

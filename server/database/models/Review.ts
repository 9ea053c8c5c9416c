import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { ReviewState } from '../../../shared/types/review'

/** A request that chosen members look at one snapshot and decide whether the design goes on. */
export class Review extends Model<InferAttributes<Review>, InferCreationAttributes<Review>> {
  declare id: CreationOptional<string>
  declare projectId: string
  declare snapshotId: string
  declare requestedBy: string | null
  declare message: CreationOptional<string>
  declare state: CreationOptional<ReviewState>
  declare closedAt: CreationOptional<Date | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    Review.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      snapshotId: { type: DataTypes.UUID, allowNull: false },
      requestedBy: { type: DataTypes.UUID, allowNull: true },
      message: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      state: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'awaiting' },
      closedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    }, { sequelize, tableName: 'reviews', underscored: true })
  }
}

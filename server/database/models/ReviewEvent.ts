import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { ReviewEventKind } from '../../../shared/types/review'

/** One step in a review's history (requested, a decision, withdrawn). */
export class ReviewEvent extends Model<InferAttributes<ReviewEvent>, InferCreationAttributes<ReviewEvent>> {
  declare id: CreationOptional<number>
  declare reviewId: string
  declare actorId: string | null
  declare kind: ReviewEventKind
  declare note: CreationOptional<string>
  declare createdAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    ReviewEvent.init({
      id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
      reviewId: { type: DataTypes.UUID, allowNull: false },
      actorId: { type: DataTypes.UUID, allowNull: true },
      kind: { type: DataTypes.STRING(24), allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      createdAt: DataTypes.DATE,
    }, { sequelize, tableName: 'review_events', underscored: true, updatedAt: false })
  }
}

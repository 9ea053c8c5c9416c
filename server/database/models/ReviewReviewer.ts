import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { ReviewDecision } from '../../../shared/types/review'

/** One member asked to decide on a review, with their decision once given. */
export class ReviewReviewer extends Model<InferAttributes<ReviewReviewer>, InferCreationAttributes<ReviewReviewer>> {
  declare reviewId: string
  declare userId: string
  declare decision: CreationOptional<ReviewDecision | null>
  declare note: CreationOptional<string>
  declare decidedAt: CreationOptional<Date | null>

  static setup(sequelize: Sequelize) {
    ReviewReviewer.init({
      reviewId: { type: DataTypes.UUID, primaryKey: true },
      userId: { type: DataTypes.UUID, primaryKey: true },
      decision: { type: DataTypes.STRING(16), allowNull: true },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      decidedAt: { type: DataTypes.DATE, allowNull: true },
    }, { sequelize, tableName: 'review_reviewers', underscored: true, timestamps: false })
  }
}

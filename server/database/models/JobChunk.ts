import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One finished chunk of a job, stored once per (job, index) however often it was run. */
export class JobChunk extends Model<InferAttributes<JobChunk>, InferCreationAttributes<JobChunk>> {
  declare jobId: string
  declare chunkIndex: number
  declare trials: number
  declare passed: number
  declare unsolved: number
  declare outcome: CreationOptional<unknown>
  declare createdAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    JobChunk.init({
      jobId: { type: DataTypes.UUID, primaryKey: true },
      chunkIndex: { type: DataTypes.INTEGER, primaryKey: true },
      trials: { type: DataTypes.INTEGER, allowNull: false },
      passed: { type: DataTypes.INTEGER, allowNull: false },
      unsolved: { type: DataTypes.INTEGER, allowNull: false },
      outcome: { type: DataTypes.JSONB, allowNull: true },
      createdAt: DataTypes.DATE,
    }, { sequelize, tableName: 'job_chunks', underscored: true, updatedAt: false })
  }
}

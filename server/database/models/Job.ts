import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { JobKind, JobParameters, JobResult, JobState } from '../../../shared/types/jobs'

/** A tolerance or optimisation run sent to the server's queue, kept with its network. */
export class Job extends Model<InferAttributes<Job>, InferCreationAttributes<Job>> {
  declare id: CreationOptional<string>
  declare projectId: string
  declare networkId: string
  declare ownerId: string | null
  declare kind: JobKind
  declare parameters: JobParameters
  declare document: unknown
  declare state: CreationOptional<JobState>
  declare chunkCount: number
  declare progressDone: CreationOptional<number>
  declare progressTotal: number
  declare result: CreationOptional<JobResult | null>
  declare error: CreationOptional<string | null>
  declare createdAt: CreationOptional<Date>
  declare startedAt: CreationOptional<Date | null>
  declare finishedAt: CreationOptional<Date | null>
  declare updatedAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    Job.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      networkId: { type: DataTypes.UUID, allowNull: false },
      ownerId: { type: DataTypes.UUID, allowNull: true },
      kind: { type: DataTypes.STRING(16), allowNull: false },
      parameters: { type: DataTypes.JSONB, allowNull: false },
      document: { type: DataTypes.JSONB, allowNull: false },
      state: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
      chunkCount: { type: DataTypes.INTEGER, allowNull: false },
      progressDone: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      progressTotal: { type: DataTypes.INTEGER, allowNull: false },
      result: { type: DataTypes.JSONB, allowNull: true },
      error: { type: DataTypes.TEXT, allowNull: true },
      createdAt: DataTypes.DATE,
      startedAt: { type: DataTypes.DATE, allowNull: true },
      finishedAt: { type: DataTypes.DATE, allowNull: true },
      updatedAt: DataTypes.DATE,
    }, { sequelize, tableName: 'jobs', underscored: true })
  }
}

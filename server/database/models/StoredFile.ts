import type { StoredFileSummary } from '../../../shared/types/api'
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** An uploaded file (e.g. measured Touchstone data) kept in the database with its project. */
export class StoredFile extends Model<InferAttributes<StoredFile>, InferCreationAttributes<StoredFile>> {
  declare id: CreationOptional<string>
  declare projectId: string
  declare name: string
  declare contentType: string
  declare size: number
  declare data: Buffer
  declare createdBy: string | null
  declare createdAt: CreationOptional<Date>
  /** 1 for the first upload, one more for each replacement. */
  declare version: CreationOptional<number>
  /** What the file holds, read when it was stored. */
  declare summary: StoredFileSummary
  declare updatedBy: string | null
  declare updatedAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    StoredFile.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(255), allowNull: false },
      contentType: { type: DataTypes.STRING(120), allowNull: false },
      size: { type: DataTypes.INTEGER, allowNull: false },
      data: { type: DataTypes.BLOB, allowNull: false },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      summary: { type: DataTypes.JSONB, allowNull: false },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
      updatedAt: DataTypes.DATE,
    }, { sequelize, tableName: 'files', underscored: true })
  }
}

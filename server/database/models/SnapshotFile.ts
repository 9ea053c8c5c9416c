import type { StoredFileSummary } from '../../../shared/types/api'
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** A snapshot's own copy of a data file that it (or a network it uses) reads, as it was when frozen. */
export class SnapshotFile extends Model<InferAttributes<SnapshotFile>, InferCreationAttributes<SnapshotFile>> {
  declare snapshotId: string
  declare name: string
  declare fileId: string | null
  declare version: number
  declare summary: StoredFileSummary
  declare data: Buffer

  static setup(sequelize: Sequelize) {
    SnapshotFile.init({
      snapshotId: { type: DataTypes.UUID, primaryKey: true },
      name: { type: DataTypes.STRING(255), primaryKey: true },
      fileId: { type: DataTypes.UUID, allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false },
      summary: { type: DataTypes.JSONB, allowNull: false },
      data: { type: DataTypes.BLOB, allowNull: false },
    }, { sequelize, tableName: 'snapshot_files', underscored: true, timestamps: false })
  }
}

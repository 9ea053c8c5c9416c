import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { NetworkDocument } from '../../../shared/network/types'
import type { CheckpointReason } from '../../../shared/types/history'

/** A whole copy of a network's document in its history, written by `server/utils/checkpoints.ts`. */
export class NetworkCheckpoint extends Model<InferAttributes<NetworkCheckpoint>, InferCreationAttributes<NetworkCheckpoint>> {
  declare id: CreationOptional<string>
  declare networkId: string
  declare document: NetworkDocument
  declare revision: number
  declare reason: CheckpointReason
  /** Members who changed the network since the checkpoint before this one. */
  declare editorIds: string[]
  declare blockCount: number
  declare createdAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    NetworkCheckpoint.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      networkId: { type: DataTypes.UUID, allowNull: false },
      document: { type: DataTypes.JSONB, allowNull: false },
      revision: { type: DataTypes.INTEGER, allowNull: false },
      reason: { type: DataTypes.STRING(32), allowNull: false },
      editorIds: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
      blockCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      createdAt: DataTypes.DATE,
    }, { sequelize, tableName: 'network_checkpoints', underscored: true, updatedAt: false })
  }
}

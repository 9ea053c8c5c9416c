import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One accepted Yjs update, kept until a merge folds it into the network's live state. */
export class NetworkUpdate extends Model<InferAttributes<NetworkUpdate>, InferCreationAttributes<NetworkUpdate>> {
  /** BIGINT comes back from pg as a string; it is only ever compared and sent on. */
  declare id: CreationOptional<string>
  declare networkId: string
  declare data: Buffer
  declare userId: string | null
  declare createdAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    NetworkUpdate.init({
      id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
      networkId: { type: DataTypes.UUID, allowNull: false },
      data: { type: DataTypes.BLOB, allowNull: false },
      userId: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
    }, { sequelize, tableName: 'network_updates', underscored: true, updatedAt: false })
  }
}

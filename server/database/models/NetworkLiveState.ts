import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** The merged Yjs state of a network being co-edited (see server/live/store.ts). */
export class NetworkLiveState extends Model<InferAttributes<NetworkLiveState>, InferCreationAttributes<NetworkLiveState>> {
  declare networkId: string
  /** A Yjs update holding the whole document as of the last merge. */
  declare state: Buffer
  declare mergedAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    NetworkLiveState.init({
      networkId: { type: DataTypes.UUID, primaryKey: true },
      state: { type: DataTypes.BLOB, allowNull: false },
      mergedAt: DataTypes.DATE,
    }, { sequelize, tableName: 'network_live_states', underscored: true, timestamps: false })
  }
}

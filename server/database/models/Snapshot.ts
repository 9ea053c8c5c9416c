import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { NetworkDocument } from '../../../shared/network/types'

/** An immutable frozen copy of a network document with its solver summary. */
export class Snapshot extends Model<InferAttributes<Snapshot>, InferCreationAttributes<Snapshot>> {
  declare id: CreationOptional<string>
  declare networkId: string
  declare title: string
  declare note: CreationOptional<string>
  declare document: NetworkDocument
  declare summary: CreationOptional<Record<string, unknown>>
  declare networkRevision: number
  /**
   * Documents of the networks it uses as sub-networks, as [reference, document] pairs (pairs, so a
   * hostile reference such as "__proto__" stays plain data); null for snapshots made before this was kept.
   */
  declare networks: CreationOptional<{ pairs: Array<[string, NetworkDocument]> } | null>
  declare createdBy: string | null
  declare createdAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    Snapshot.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      networkId: { type: DataTypes.UUID, allowNull: false },
      title: { type: DataTypes.STRING(200), allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      document: { type: DataTypes.JSONB, allowNull: false },
      summary: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      networkRevision: { type: DataTypes.INTEGER, allowNull: false },
      networks: { type: DataTypes.JSONB, allowNull: true },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
    }, { sequelize, tableName: 'snapshots', underscored: true, updatedAt: false })
  }
}

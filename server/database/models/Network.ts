import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { NetworkDocument } from '../../../shared/network/types'

export class Network extends Model<InferAttributes<Network>, InferCreationAttributes<Network>> {
  declare id: CreationOptional<string>
  declare projectId: string
  declare name: string
  declare document: NetworkDocument
  /** Optimistic-concurrency counter: every stored change increments it. */
  declare revision: CreationOptional<number>
  declare updatedBy: string | null
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    Network.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(200), allowNull: false },
      document: { type: DataTypes.JSONB, allowNull: false },
      revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    }, { sequelize, tableName: 'networks', underscored: true })
  }
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { ProjectRole } from '../../../shared/types/api'

export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare projectId: string
  declare userId: string
  declare role: ProjectRole
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    Membership.init({
      projectId: { type: DataTypes.UUID, primaryKey: true },
      userId: { type: DataTypes.UUID, primaryKey: true },
      role: { type: DataTypes.STRING(16), allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    }, { sequelize, tableName: 'memberships', underscored: true })
  }
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** An append-only record of who did what to a project. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>
  declare projectId: string | null
  declare actorId: string | null
  declare action: string
  declare detail: CreationOptional<Record<string, unknown>>
  declare createdAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    AuditEvent.init({
      id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
      projectId: { type: DataTypes.UUID, allowNull: true },
      actorId: { type: DataTypes.UUID, allowNull: true },
      action: { type: DataTypes.STRING(64), allowNull: false },
      detail: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      createdAt: DataTypes.DATE,
    }, { sequelize, tableName: 'audit_events', underscored: true, updatedAt: false })
  }
}

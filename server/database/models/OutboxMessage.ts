import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** A message received by the local stand-in SMTP server (development and tests), parsed for the admin outbox. */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<string>
  declare envelopeFrom: string
  declare envelopeTo: string[]
  declare subject: string
  declare textBody: string
  declare htmlBody: string
  declare raw: string
  declare receivedAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    OutboxMessage.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      envelopeFrom: { type: DataTypes.STRING(254), allowNull: false, defaultValue: '' },
      envelopeTo: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
      subject: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      textBody: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      htmlBody: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      raw: { type: DataTypes.TEXT, allowNull: false },
      receivedAt: DataTypes.DATE,
    }, { sequelize, tableName: 'outbox_messages', underscored: true, createdAt: 'receivedAt', updatedAt: false })
  }
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** A review comment on a snapshot; `anchor` says whether it targets the snapshot, a block or a frequency range. */
export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<string>
  declare snapshotId: string
  declare parentId: string | null
  declare authorId: string | null
  declare body: string
  declare anchor: CreationOptional<Record<string, unknown>>
  declare resolvedAt: Date | null
  declare resolvedBy: CreationOptional<string | null>
  /** Set when the author changes the body; resolving does not count as an edit. */
  declare editedAt: CreationOptional<Date | null>
  /** User ids mentioned in the body, so an edit mails only newly mentioned people. */
  declare mentions: CreationOptional<string[]>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    Comment.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      snapshotId: { type: DataTypes.UUID, allowNull: false },
      parentId: { type: DataTypes.UUID, allowNull: true },
      authorId: { type: DataTypes.UUID, allowNull: true },
      body: { type: DataTypes.TEXT, allowNull: false },
      anchor: { type: DataTypes.JSONB, allowNull: false, defaultValue: { kind: 'snapshot' } },
      resolvedAt: { type: DataTypes.DATE, allowNull: true },
      resolvedBy: { type: DataTypes.UUID, allowNull: true },
      editedAt: { type: DataTypes.DATE, allowNull: true },
      mentions: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    }, { sequelize, tableName: 'comments', underscored: true })
  }
}

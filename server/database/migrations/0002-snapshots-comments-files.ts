import { DataTypes, literal, type QueryInterface } from 'sequelize'

/** Frozen snapshots of networks, review comments on them, and uploaded files. */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('snapshots', {
    id: { type: DataTypes.UUID, primaryKey: true },
    network_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'networks', key: 'id' }, onDelete: 'CASCADE' },
    title: { type: DataTypes.STRING(200), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    document: { type: DataTypes.JSONB, allowNull: false },
    summary: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    network_revision: { type: DataTypes.INTEGER, allowNull: false },
    created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') },
  })
  await qi.addIndex('snapshots', ['network_id', 'created_at'])
  await qi.createTable('comments', {
    id: { type: DataTypes.UUID, primaryKey: true },
    snapshot_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'snapshots', key: 'id' }, onDelete: 'CASCADE' },
    parent_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'comments', key: 'id' }, onDelete: 'CASCADE' },
    author_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    body: { type: DataTypes.TEXT, allowNull: false },
    anchor: { type: DataTypes.JSONB, allowNull: false, defaultValue: { kind: 'snapshot' } },
    resolved_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') },
  })
  await qi.addIndex('comments', ['snapshot_id'])
  await qi.createTable('files', {
    id: { type: DataTypes.UUID, primaryKey: true },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'projects', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(255), allowNull: false },
    content_type: { type: DataTypes.STRING(120), allowNull: false },
    size: { type: DataTypes.INTEGER, allowNull: false },
    data: { type: DataTypes.BLOB, allowNull: false },
    created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') },
  })
  await qi.addIndex('files', ['project_id'])
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['files', 'comments', 'snapshots']) await qi.dropTable(table)
}

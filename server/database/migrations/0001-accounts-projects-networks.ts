import { DataTypes, literal, type QueryInterface } from 'sequelize'

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') },
}

/** Users, projects with per-project roles, network documents, audit trail, sign-in limiter counters. */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('users', {
    id: { type: DataTypes.UUID, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.TEXT, allowNull: false },
    is_admin: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    session_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    ...timestamps,
  })
  await qi.createTable('projects', {
    id: { type: DataTypes.UUID, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    ...timestamps,
  })
  await qi.createTable('memberships', {
    project_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'projects', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    role: { type: DataTypes.STRING(16), allowNull: false },
    ...timestamps,
  })
  await qi.sequelize.query(
    `ALTER TABLE memberships ADD CONSTRAINT memberships_role_check CHECK (role IN ('owner','editor','reviewer','viewer'))`,
  )
  await qi.addIndex('memberships', ['user_id'])
  await qi.createTable('networks', {
    id: { type: DataTypes.UUID, primaryKey: true },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'projects', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(200), allowNull: false },
    document: { type: DataTypes.JSONB, allowNull: false },
    revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    updated_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    ...timestamps,
  })
  await qi.addIndex('networks', ['project_id'])
  await qi.createTable('audit_events', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    project_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'projects', key: 'id' }, onDelete: 'CASCADE' },
    actor_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    action: { type: DataTypes.STRING(64), allowNull: false },
    detail: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') },
  })
  await qi.addIndex('audit_events', ['project_id', 'created_at'])
  // Shape required by the sign-in limiter's PostgreSQL store.
  await qi.createTable('rate_limits', {
    key: { type: DataTypes.STRING(255), primaryKey: true },
    points: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    expire: { type: DataTypes.BIGINT, allowNull: true },
  })
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['rate_limits', 'audit_events', 'networks', 'memberships', 'projects', 'users']) {
    await qi.dropTable(table)
  }
}

import { DataTypes, literal, type QueryInterface } from 'sequelize'

const now = { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') }

/**
 * Personal access tokens for the automation API: each belongs to one person, names the projects it may reach
 * and a role ceiling, and expires. Only a SHA-256 of the secret is kept, so a database leak hands out nothing.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('access_tokens', {
    id: { type: DataTypes.UUID, primaryKey: true },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    // The first characters of the secret, shown in the list so a person can tell their tokens apart.
    hint: { type: DataTypes.STRING(16), allowNull: false },
    role_ceiling: { type: DataTypes.STRING(16), allowNull: false },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    last_used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: now,
  })
  await qi.sequelize.query(
    `ALTER TABLE access_tokens ADD CONSTRAINT access_tokens_role_ceiling_check CHECK (role_ceiling IN ('editor','reviewer','viewer'))`,
  )
  await qi.addIndex('access_tokens', ['user_id'])

  // A project's deletion takes it out of every token's scope.
  await qi.createTable('access_token_projects', {
    token_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'access_tokens', key: 'id' }, onDelete: 'CASCADE' },
    project_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'projects', key: 'id' }, onDelete: 'CASCADE' },
  })
  await qi.addIndex('access_token_projects', ['project_id'])
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('access_token_projects')
  await qi.dropTable('access_tokens')
}

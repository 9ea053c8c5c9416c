import { DataTypes, literal, type QueryInterface } from 'sequelize'

const now = { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') }

/**
 * Server-side sessions and password-reset links. A session row is what a sign-in
 * cookie points at; revoking the row ends that session on its next request. Both
 * tables keep only a SHA-256 of the secret the browser or the e-mail holds, so a
 * database leak hands out no working cookie or link.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('sessions', {
    // The row's public handle (account page, revoke button); never enough to act as the session.
    id: { type: DataTypes.UUID, primaryKey: true },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    user_agent: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    created_at: now,
    last_seen_at: now,
    revoked_at: { type: DataTypes.DATE, allowNull: true },
  })
  await qi.addIndex('sessions', ['user_id'])
  await qi.addIndex('sessions', ['last_seen_at'])

  await qi.createTable('password_resets', {
    id: { type: DataTypes.UUID, primaryKey: true },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    created_at: now,
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
  })
  await qi.addIndex('password_resets', ['user_id'])
  await qi.addIndex('password_resets', ['expires_at'])
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('password_resets')
  await qi.dropTable('sessions')
}

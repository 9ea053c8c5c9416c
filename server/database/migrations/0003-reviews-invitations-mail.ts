import { DataTypes, literal, type QueryInterface } from 'sequelize'

const now = { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') }

/** Design reviews with their reviewers and history, e-mail invitations, the local mail outbox, and comment mentions. */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('invitations', {
    id: { type: DataTypes.UUID, primaryKey: true },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'projects', key: 'id' }, onDelete: 'CASCADE' },
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    // Only a SHA-256 of the token is kept: a database leak must not hand out working links.
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    invited_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    accepted_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    created_at: now,
  })
  await qi.sequelize.query(
    `ALTER TABLE invitations ADD CONSTRAINT invitations_role_check CHECK (role IN ('owner','editor','reviewer','viewer'))`,
  )
  await qi.addIndex('invitations', ['project_id', 'created_at'])

  await qi.createTable('reviews', {
    id: { type: DataTypes.UUID, primaryKey: true },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'projects', key: 'id' }, onDelete: 'CASCADE' },
    snapshot_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'snapshots', key: 'id' }, onDelete: 'CASCADE' },
    requested_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    message: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    state: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'awaiting' },
    closed_at: { type: DataTypes.DATE, allowNull: true },
    created_at: now,
    updated_at: now,
  })
  await qi.sequelize.query(
    `ALTER TABLE reviews ADD CONSTRAINT reviews_state_check CHECK (state IN ('awaiting','cleared','sent-back','withdrawn'))`,
  )
  await qi.addIndex('reviews', ['snapshot_id'])
  await qi.addIndex('reviews', ['project_id', 'state'])

  await qi.createTable('review_reviewers', {
    review_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'reviews', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    decision: { type: DataTypes.STRING(16), allowNull: true },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    decided_at: { type: DataTypes.DATE, allowNull: true },
  })
  await qi.sequelize.query(
    `ALTER TABLE review_reviewers ADD CONSTRAINT review_reviewers_decision_check CHECK (decision IS NULL OR decision IN ('clear','send-back'))`,
  )
  await qi.addIndex('review_reviewers', ['user_id'])

  await qi.createTable('review_events', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    review_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'reviews', key: 'id' }, onDelete: 'CASCADE' },
    actor_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    kind: { type: DataTypes.STRING(24), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    created_at: now,
  })
  await qi.addIndex('review_events', ['review_id', 'created_at'])

  await qi.createTable('outbox_messages', {
    id: { type: DataTypes.UUID, primaryKey: true },
    envelope_from: { type: DataTypes.STRING(254), allowNull: false, defaultValue: '' },
    envelope_to: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    subject: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    text_body: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    html_body: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    raw: { type: DataTypes.TEXT, allowNull: false },
    received_at: now,
  })
  await qi.addIndex('outbox_messages', ['received_at'])

  // Who was mentioned, so an edit mails only the people it newly mentions.
  await qi.addColumn('comments', 'mentions', { type: DataTypes.JSONB, allowNull: false, defaultValue: [] })
  await qi.addColumn('comments', 'edited_at', { type: DataTypes.DATE, allowNull: true })
  await qi.addColumn('comments', 'resolved_by', { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' })
  await qi.addIndex('comments', ['parent_id'])
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeIndex('comments', ['parent_id'])
  await qi.removeColumn('comments', 'resolved_by')
  await qi.removeColumn('comments', 'edited_at')
  await qi.removeColumn('comments', 'mentions')
  for (const table of ['outbox_messages', 'review_events', 'review_reviewers', 'reviews', 'invitations']) await qi.dropTable(table)
}

import { DataTypes, literal, type QueryInterface } from 'sequelize'

const now = { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') }

/**
 * Long tolerance and optimisation runs sent to the server: one row per run (what was asked, by whom, how far it
 * got, the answer) and one row per finished chunk of it. A chunk is keyed by (job, index), so a chunk run twice
 * (a worker killed after writing it) is stored once, and the totals are always summed from the stored chunks.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('jobs', {
    id: { type: DataTypes.UUID, primaryKey: true },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'projects', key: 'id' }, onDelete: 'CASCADE' },
    network_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'networks', key: 'id' }, onDelete: 'CASCADE' },
    owner_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    kind: { type: DataTypes.STRING(16), allowNull: false },
    parameters: { type: DataTypes.JSONB, allowNull: false },
    // The document as it was when the run was sent: later edits never change a run half-way.
    document: { type: DataTypes.JSONB, allowNull: false },
    state: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
    chunk_count: { type: DataTypes.INTEGER, allowNull: false },
    progress_done: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    progress_total: { type: DataTypes.INTEGER, allowNull: false },
    result: { type: DataTypes.JSONB, allowNull: true },
    error: { type: DataTypes.TEXT, allowNull: true },
    created_at: now,
    started_at: { type: DataTypes.DATE, allowNull: true },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    updated_at: now,
  })
  await qi.sequelize.query(`ALTER TABLE jobs ADD CONSTRAINT jobs_kind_check CHECK (kind IN ('tolerance','optimize'))`)
  await qi.sequelize.query(`ALTER TABLE jobs ADD CONSTRAINT jobs_state_check CHECK (state IN ('queued','running','done','failed','cancelled'))`)
  await qi.addIndex('jobs', ['network_id', 'created_at'])
  await qi.addIndex('jobs', ['project_id', 'state'])

  await qi.createTable('job_chunks', {
    job_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'jobs', key: 'id' }, onDelete: 'CASCADE' },
    chunk_index: { type: DataTypes.INTEGER, primaryKey: true },
    trials: { type: DataTypes.INTEGER, allowNull: false },
    passed: { type: DataTypes.INTEGER, allowNull: false },
    unsolved: { type: DataTypes.INTEGER, allowNull: false },
    // An optimisation's answer (its single chunk); null for tolerance chunks.
    outcome: { type: DataTypes.JSONB, allowNull: true },
    created_at: now,
  })
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('job_chunks')
  await qi.dropTable('jobs')
}

import { DataTypes, literal, type QueryInterface } from 'sequelize'

/**
 * History checkpoints: whole copies of a network's document with when, why and
 * who changed it since the checkpoint before. Written automatically while a live
 * session edits (at most one per interval, and one when the last editor leaves),
 * on every save through the API and on every restore; pruned on write.
 * `network_live_states.editors_since_checkpoint` collects the members whose live
 * updates were merged since the network's newest checkpoint.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('network_checkpoints', {
    id: { type: DataTypes.UUID, primaryKey: true },
    network_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'networks', key: 'id' }, onDelete: 'CASCADE' },
    document: { type: DataTypes.JSONB, allowNull: false },
    revision: { type: DataTypes.INTEGER, allowNull: false },
    reason: { type: DataTypes.STRING(32), allowNull: false },
    editor_ids: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
    block_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') },
  })
  await qi.sequelize.query(
    `ALTER TABLE network_checkpoints ADD CONSTRAINT network_checkpoints_reason_check CHECK (reason IN
      ('editing','session-end','save','snapshot-restore','checkpoint-restore','before-change'))`,
  )
  await qi.addIndex('network_checkpoints', ['network_id', 'created_at'])
  await qi.addColumn('network_live_states', 'editors_since_checkpoint', { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] })
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeColumn('network_live_states', 'editors_since_checkpoint')
  await qi.dropTable('network_checkpoints')
}

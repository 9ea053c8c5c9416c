import { DataTypes, literal, type QueryInterface } from 'sequelize'

/**
 * Live co-editing storage. `network_live_states` holds one merged Yjs state per
 * network; `network_updates` is the append-only log of accepted updates since
 * the last merge. An update is written here before any other client sees it,
 * and a merge folds the log into the state in one transaction.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('network_live_states', {
    network_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'networks', key: 'id' }, onDelete: 'CASCADE' },
    state: { type: DataTypes.BLOB, allowNull: false },
    merged_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') },
  })
  await qi.createTable('network_updates', {
    // BIGSERIAL: the id is what LISTEN/NOTIFY carries between app instances.
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    network_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'networks', key: 'id' }, onDelete: 'CASCADE' },
    data: { type: DataTypes.BLOB, allowNull: false },
    user_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') },
  })
  await qi.addIndex('network_updates', ['network_id', 'id'])
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('network_updates')
  await qi.dropTable('network_live_states')
}

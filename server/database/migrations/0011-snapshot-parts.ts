import { DataTypes, type QueryInterface } from 'sequelize'

/**
 * What a snapshot freezes besides its own document: the documents of the networks it uses as
 * sub-networks (transitively, by the reference its blocks use) and a copy of every data file they
 * read, byte for byte with the version it had. A snapshot made before this keeps `networks` NULL and
 * no file rows: it still reads the project's current networks and files.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.addColumn('snapshots', 'networks', { type: DataTypes.JSONB, allowNull: true })
  await qi.createTable('snapshot_files', {
    snapshot_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'snapshots', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(255), primaryKey: true },
    // The project file it was copied from; NULL once that file is deleted (the copy stays).
    file_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'files', key: 'id' }, onDelete: 'SET NULL' },
    version: { type: DataTypes.INTEGER, allowNull: false },
    summary: { type: DataTypes.JSONB, allowNull: false },
    data: { type: DataTypes.BLOB, allowNull: false },
  })
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('snapshot_files')
  await qi.removeColumn('snapshots', 'networks')
}

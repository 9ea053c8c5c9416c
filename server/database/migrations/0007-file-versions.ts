import { DataTypes, literal, type QueryInterface } from 'sequelize'

/** Uploaded files get a version number, a summary of what they hold, and who replaced them last and when. */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.addColumn('files', 'version', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 })
  await qi.addColumn('files', 'summary', { type: DataTypes.JSONB, allowNull: false, defaultValue: {} })
  await qi.addColumn('files', 'updated_by', { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' })
  await qi.addColumn('files', 'updated_at', { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') })
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const column of ['updated_at', 'updated_by', 'summary', 'version']) await qi.removeColumn('files', column)
}

import { DataTypes, literal, type QueryInterface } from 'sequelize'

const now = { type: DataTypes.DATE, allowNull: false, defaultValue: literal('CURRENT_TIMESTAMP') }

/**
 * A project's library of named boards: the values a network's `substrates` entry holds, in SI units,
 * kept once per project so that its networks copy the same board rather than retype it.
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.createTable('project_substrates', {
    id: { type: DataTypes.UUID, primaryKey: true },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'projects', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    permittivity: { type: DataTypes.DOUBLE, allowNull: false },
    height: { type: DataTypes.DOUBLE, allowNull: false },
    thickness: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    loss_tangent: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    // Absent: lossless metal, as in a document's substrate.
    conductivity: { type: DataTypes.DOUBLE, allowNull: true },
    roughness: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    updated_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: now,
    updated_at: now,
  })
  await qi.addIndex('project_substrates', ['project_id', 'name'], { unique: true })
  await qi.sequelize.query(
    'ALTER TABLE project_substrates ADD CONSTRAINT project_substrates_values_check CHECK (permittivity >= 1 AND height > 0 AND thickness >= 0 AND loss_tangent >= 0 AND roughness >= 0 AND (conductivity IS NULL OR conductivity > 0))',
  )
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('project_substrates')
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** A named board in a project's substrate library, its values in SI units. */
export class ProjectSubstrate extends Model<InferAttributes<ProjectSubstrate>, InferCreationAttributes<ProjectSubstrate>> {
  declare id: CreationOptional<string>
  declare projectId: string
  declare name: string
  declare permittivity: number
  declare height: number
  declare thickness: CreationOptional<number>
  declare lossTangent: CreationOptional<number>
  declare conductivity: number | null
  declare roughness: CreationOptional<number>
  declare note: CreationOptional<string>
  declare updatedBy: string | null
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static setup(sequelize: Sequelize) {
    ProjectSubstrate.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      projectId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(80), allowNull: false },
      permittivity: { type: DataTypes.DOUBLE, allowNull: false },
      height: { type: DataTypes.DOUBLE, allowNull: false },
      thickness: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      lossTangent: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      conductivity: { type: DataTypes.DOUBLE, allowNull: true },
      roughness: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    }, { sequelize, tableName: 'project_substrates', underscored: true })
  }
}

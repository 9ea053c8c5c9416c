import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One project in an access token's scope. */
export class AccessTokenProject extends Model<InferAttributes<AccessTokenProject>, InferCreationAttributes<AccessTokenProject>> {
  declare tokenId: string
  declare projectId: string

  static setup(sequelize: Sequelize) {
    AccessTokenProject.init({
      tokenId: { type: DataTypes.UUID, primaryKey: true },
      projectId: { type: DataTypes.UUID, primaryKey: true },
    }, { sequelize, tableName: 'access_token_projects', underscored: true, timestamps: false })
  }
}

import { Umzug, SequelizeStorage } from 'umzug'
import type { Sequelize } from 'sequelize'
import { migrations } from './migrations'

/** Umzug over the explicit migration list; applied names are kept in table `schema_migrations`. */
export function createMigrator(sequelize: Sequelize) {
  const qi = sequelize.getQueryInterface()
  return new Umzug({
    migrations: migrations.map(step => ({
      name: step.name,
      up: () => step.up(qi),
      down: () => step.down(qi),
    })),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  })
}

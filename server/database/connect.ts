import pg from 'pg'
import { Sequelize } from 'sequelize'
import { setupModels } from './models'

/** Opens Sequelize on a PostgreSQL URL with every model bound. */
export function connectDatabase(url: string, options: { pool?: number } = {}): Sequelize {
  // Passing the driver explicitly keeps the bundled server independent of node_modules layout.
  const sequelize = new Sequelize(url, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    pool: { max: options.pool ?? 10, idle: 10_000 },
  })
  setupModels(sequelize)
  return sequelize
}

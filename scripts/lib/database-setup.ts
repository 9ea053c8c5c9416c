import { Umzug, SequelizeStorage } from 'umzug'
import { Hash } from '@adonisjs/hash'
import { Scrypt } from '@adonisjs/hash/drivers/scrypt'
import { connectDatabase } from '../../server/database/connect'
import { createMigrator } from '../../server/database/migrator'
import { seedDemo } from '../../server/database/seeders/seed-demo'
import { seedMeasuredParts } from '../../server/database/seeders/seed-measured-parts'

// Same algorithm and defaults as the server's hashPassword, so seeded users can sign in.
const hasher = new Hash(new Scrypt({}))

/** Applies pending migrations and, once per database, the demo data. */
export async function prepareDatabase(url: string, options: { seed: boolean }): Promise<{ migrated: string[]; seeded: boolean }> {
  const sequelize = connectDatabase(url, { pool: 2 })
  try {
    const applied = await createMigrator(sequelize).up()
    let seeded = false
    if (options.seed) {
      const seeds = new Umzug({
        migrations: [
          { name: 'demo-scenario', up: () => seedDemo(sequelize, pw => hasher.make(pw)) },
          // A later step, so that a database seeded before the demo files existed gets them too.
          { name: 'demo-measured-parts', up: () => seedMeasuredParts(sequelize) },
        ],
        storage: new SequelizeStorage({ sequelize, tableName: 'schema_seeds' }),
        logger: undefined,
      })
      seeded = (await seeds.up()).length > 0
    }
    return { migrated: applied.map(m => m.name), seeded }
  } finally {
    await sequelize.close()
  }
}

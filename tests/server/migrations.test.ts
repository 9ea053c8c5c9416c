import { randomUUID } from 'node:crypto'
import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { connectDatabase } from '../../server/database/connect'
import { createMigrator } from '../../server/database/migrator'
import { migrations } from '../../server/database/migrations'

/** Runs the real migrations on a database of its own inside the test cluster. */
const adminUrl = process.env.PORTWRIGHT_TEST_ADMIN_URL!
const dbName = `migrations_${randomUUID().replace(/-/g, '')}`
const dbUrl = adminUrl.replace(/\/postgres$/, `/${dbName}`)

async function admin(sql: string) {
  const client = new pg.Client({ connectionString: adminUrl })
  await client.connect()
  try { await client.query(sql) } finally { await client.end() }
}

const sequelize = connectDatabase(dbUrl, { pool: 2 })

beforeAll(() => admin(`CREATE DATABASE ${dbName}`))
afterAll(async () => {
  await sequelize.close()
  await admin(`DROP DATABASE IF EXISTS ${dbName}`)
})

describe('migrations', () => {
  it('apply step by step from an empty database and keep the data written between steps', async () => {
    const migrator = createMigrator(sequelize)
    const first = await migrator.up({ to: migrations[0]!.name })
    expect(first.map(m => m.name)).toEqual([migrations[0]!.name])
    const userId = randomUUID()
    const projectId = randomUUID()
    await sequelize.query(`INSERT INTO users (id, email, name, password_hash) VALUES ('${userId}', 'keep@test.example', 'Kept', 'x')`)
    await sequelize.query(`INSERT INTO projects (id, name, created_by) VALUES ('${projectId}', 'Kept project', '${userId}')`)
    await sequelize.query(`INSERT INTO networks (id, project_id, name, document) VALUES ('${randomUUID()}', '${projectId}', 'Kept network', '{"format":"portwright.network","version":1,"blocks":[],"wires":[]}')`)

    const rest = await migrator.up()
    expect(rest.map(m => m.name)).toEqual(migrations.slice(1).map(m => m.name))
    const [rows] = await sequelize.query(`SELECT n.name AS network, p.name AS project, u.email FROM networks n JOIN projects p ON p.id = n.project_id JOIN users u ON u.id = p.created_by`)
    expect(rows).toEqual([{ network: 'Kept network', project: 'Kept project', email: 'keep@test.example' }])
  })

  it('are a no-op when run again', async () => {
    const again = await createMigrator(sequelize).up()
    expect(again).toEqual([])
    const [applied] = await sequelize.query('SELECT name FROM schema_migrations ORDER BY name')
    expect(applied).toEqual(migrations.map(m => ({ name: m.name })))
  })

  it('enforce the role names in the database itself', async () => {
    await expect(sequelize.query(`INSERT INTO memberships (project_id, user_id, role) SELECT p.id, p.created_by, 'superuser' FROM projects p LIMIT 1`))
      .rejects.toThrow(/memberships_role_check/)
  })
})

import type { Sequelize } from 'sequelize'
import { connectDatabase } from '~~/server/database/connect'

let instance: Sequelize | undefined

/** The process-wide Sequelize instance, opened on first use from NUXT_DATABASE_URL. */
export function useDatabase(): Sequelize {
  if (!instance) {
    const url = useRuntimeConfig().databaseUrl || process.env.NUXT_DATABASE_URL
    if (!url) throw createError({ statusCode: 500, message: 'Database is not configured (NUXT_DATABASE_URL is empty).' })
    instance = connectDatabase(url)
  }
  return instance
}

/** Closes the shared instance (server shutdown). */
export async function closeDatabase(): Promise<void> {
  await instance?.close()
  instance = undefined
}

import { randomBytes } from 'node:crypto'
import { Hash } from '@adonisjs/hash'
import { Scrypt } from '@adonisjs/hash/drivers/scrypt'
import { QueryTypes } from 'sequelize'
import { connectDatabase } from '../../server/database/connect'
import { DEMO_PASSWORD, demoPeople } from '../../server/database/seeders/demo-scenario'

const hasher = new Hash(new Scrypt({}))
const demoEmails = demoPeople.map(p => p.email)

/** Whether an address the app listens on reaches only this machine. */
export function isLoopback(host: string): boolean {
  return host === 'localhost' || host === '::1' || host === '[::1]' || /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(host)
}

/** Demo accounts that still sign in with the README's published password. */
export async function demoAccountsWithPublishedPassword(url: string): Promise<string[]> {
  const sequelize = connectDatabase(url, { pool: 1 })
  try {
    const rows = await sequelize.query<{ email: string, password_hash: string }>(
      'SELECT email, password_hash FROM users WHERE email IN (:emails)',
      { replacements: { emails: demoEmails }, type: QueryTypes.SELECT },
    )
    const open: string[] = []
    for (const row of rows) if (await hasher.verify(row.password_hash, DEMO_PASSWORD)) open.push(row.email)
    return open
  } finally {
    await sequelize.close()
  }
}

/** Gives every demo account a random password nobody knows and ends its sessions; returns how many changed. */
export async function disableDemoAccounts(url: string): Promise<number> {
  const sequelize = connectDatabase(url, { pool: 1 })
  try {
    let changed = 0
    const probe = await sequelize.query<{ present: boolean }>("SELECT to_regclass('public.sessions') IS NOT NULL AS present", { type: QueryTypes.SELECT })
    const present = probe[0]?.present === true
    for (const email of demoEmails) {
      const hash = await hasher.make(randomBytes(32).toString('base64url'))
      const [, count] = await sequelize.query(
        'UPDATE users SET password_hash = :hash, session_version = session_version + 1 WHERE email = :email',
        { replacements: { hash, email }, type: QueryTypes.UPDATE },
      )
      changed += Number(count) || 0
      // Their session rows are revoked too, so the account page lists none of them as active.
      if (present) await sequelize.query(
        'UPDATE sessions SET revoked_at = now() WHERE revoked_at IS NULL AND user_id IN (SELECT id FROM users WHERE email = :email)',
        { replacements: { email }, type: QueryTypes.UPDATE },
      )
    }
    return changed
  } finally {
    await sequelize.close()
  }
}

/** The refusal printed when the app would serve a network with the README's demo password still valid. */
export function demoRefusal(host: string, emails: string[]): string {
  return [
    `Portwright will not listen on ${host} while demo accounts still have the published demo password:`,
    ...emails.map(e => `  ${e}`),
    'Anyone who has read the README could sign in as them. Either',
    '  npm run demo:disable        (gives every demo account a random password nobody knows), or',
    '  set their passwords through the app on 127.0.0.1 first, or',
    '  start with a fresh PORTWRIGHT_DATA_DIR and PORTWRIGHT_SEED=0 (no demo data at all).',
  ].join('\n')
}

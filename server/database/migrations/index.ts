import type { QueryInterface } from 'sequelize'
import * as m0001 from './0001-accounts-projects-networks'
import * as m0002 from './0002-snapshots-comments-files'

export interface MigrationStep {
  name: string
  up: (qi: QueryInterface) => Promise<void>
  down: (qi: QueryInterface) => Promise<void>
}

/** Every migration in order; listed explicitly so bundlers and tsx see the same set. */
export const migrations: MigrationStep[] = [
  { name: '0001-accounts-projects-networks', ...m0001 },
  { name: '0002-snapshots-comments-files', ...m0002 },
]

import type { QueryInterface } from 'sequelize'
import * as m0001 from './0001-accounts-projects-networks'
import * as m0002 from './0002-snapshots-comments-files'
import * as m0003 from './0003-reviews-invitations-mail'
import * as m0004 from './0004-live-document-updates'
import * as m0005 from './0005-sessions-password-resets'
import * as m0006 from './0006-network-checkpoints'
import * as m0007 from './0007-file-versions'
import * as m0008 from './0008-access-tokens'
import * as m0009 from './0009-substrate-library'
import * as m0010 from './0010-jobs'
import * as m0011 from './0011-snapshot-parts'

export interface MigrationStep {
  name: string
  up: (qi: QueryInterface) => Promise<void>
  down: (qi: QueryInterface) => Promise<void>
}

/** Every migration in order; listed explicitly so bundlers and tsx see the same set. */
export const migrations: MigrationStep[] = [
  { name: '0001-accounts-projects-networks', ...m0001 },
  { name: '0002-snapshots-comments-files', ...m0002 },
  { name: '0003-reviews-invitations-mail', ...m0003 },
  { name: '0004-live-document-updates', ...m0004 },
  { name: '0005-sessions-password-resets', ...m0005 },
  { name: '0006-network-checkpoints', ...m0006 },
  { name: '0007-file-versions', ...m0007 },
  { name: '0008-access-tokens', ...m0008 },
  { name: '0009-substrate-library', ...m0009 },
  { name: '0010-jobs', ...m0010 },
  { name: '0011-snapshot-parts', ...m0011 },
]

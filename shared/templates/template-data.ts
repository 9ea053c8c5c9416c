import type { DataResolver } from '../solver/prepare'
import type { DataSet } from '../solver/types'
import { portsFromFileName, readTouchstone } from '../touchstone/read'
import type { NetworkTemplate } from './types'

/** Gives a template's `data` blocks its own files (read once each), for solving it outside a project. */
export function templateDataResolver(template: Pick<NetworkTemplate, 'files'>): DataResolver {
  const read = new Map<string, DataSet>()
  return (name) => {
    const file = template.files?.find(f => f.name === name)
    if (!file) return undefined
    let data = read.get(name)
    if (!data) read.set(name, data = readTouchstone(file.text(), { ports: portsFromFileName(name) }))
    return data
  }
}

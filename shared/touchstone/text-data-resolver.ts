import type { DataResolver } from '../solver/prepare'
import type { DataSet } from '../solver/types'
import { portsFromFileName, readTouchstone } from './read'

/**
 * A data resolver over Touchstone texts by file name: each file is read on first use and once however many
 * blocks name it; an unknown name resolves to nothing (the solver names the block and file).
 */
export function textDataResolver(files: Iterable<readonly [string, string]>): DataResolver {
  const texts = new Map(files)
  const read = new Map<string, DataSet>()
  return (name) => {
    const text = texts.get(name)
    if (text === undefined) return undefined
    let data = read.get(name)
    if (!data) read.set(name, data = readTouchstone(text, { ports: portsFromFileName(name) }))
    return data
  }
}

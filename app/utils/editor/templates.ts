import type { NetworkDocument } from '~~/shared/network/types'

// Example documents shipped with the solver double as starting points.
const modules = import.meta.glob<NetworkDocument>('../../../shared/examples/*.json', { eager: true, import: 'default' })

/** Templates offered on an empty network: name and document. */
export const templates: Array<{ name: string, document: NetworkDocument }> = Object.entries(modules)
  .map(([path, document]) => ({ name: document.name ?? path.split('/').pop()!.replace(/\.json$/, ''), document }))
  .sort((a, b) => a.name.localeCompare(b.name))

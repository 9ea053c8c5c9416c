import type { NetworkDocument } from '~~/shared/network/types'
import type { DataSet } from '~~/shared/solver/types'
import type { DataResolver, SubnetworkResolver } from '~~/shared/solver'
import { dataFileReferences } from '~~/shared/network/external-refs'

/** The solver's resolvers for one document, with everything they answer already loaded. */
export interface LoadedResolvers {
  resolveSubnetwork: SubnetworkResolver
  resolveData: DataResolver
}

/**
 * Loads the data sets a document and its inner networks read (each file once; a file that does not
 * load stays unresolved, so the solver names it) and answers sub-networks from the given documents.
 */
export async function loadResolvers(
  document: NetworkDocument,
  inner: Iterable<[string, NetworkDocument | null]>,
  loadData: (name: string) => Promise<DataSet | undefined>,
): Promise<LoadedResolvers> {
  const networks = new Map<string, NetworkDocument>()
  for (const [ref, doc] of inner) if (doc) networks.set(ref, doc)
  const sets = new Map<string, DataSet>()
  for (const name of dataFileReferences([document, ...networks.values()])) {
    const data = await loadData(name).catch(() => undefined)
    if (data) sets.set(name, data)
  }
  return { resolveSubnetwork: ref => networks.get(ref), resolveData: name => sets.get(name) }
}

/**
 * What the editor knows of its project's files and networks: the lists (for the pickers), the
 * inner documents of sub-networks (for the solve worker and for terminals) and each data file's
 * or inner network's ports. One instance per project, shared by the canvas, inspector and worker.
 */
import { getCurrentInstance, inject, shallowRef, triggerRef, type InjectionKey } from 'vue'
import type { NetworkDocument } from '~~/shared/network/types'
import type { NetworkDto, NetworkSummaryDto, StoredFileDataDto, StoredFileDto } from '~~/shared/types/api'
import { projectDataLoader } from '~~/app/utils/editor/projectDataLoader'
import { externalRef, innerPorts, subnetworkRefs, type ExternalPorts } from '~~/app/utils/editor/externalTerminals'

function createParts(projectId: string) {
  const files = shallowRef<StoredFileDto[]>([])
  const networks = shallowRef<NetworkSummaryDto[]>([])
  /** Inner documents by the name (or id) a subnetwork block uses; null when it could not be loaded. */
  const inner = shallowRef(new Map<string, NetworkDocument | null>())
  let filesLoad: Promise<void> | null = null
  let networksLoad: Promise<void> | null = null
  let dataLoader = projectDataLoader(projectId)

  const loadFiles = (again = false) => (!filesLoad || again)
    ? (filesLoad = $fetch<StoredFileDto[]>(`/api/projects/${projectId}/files`).then((list) => { files.value = list }, () => {}))
    : filesLoad
  const loadNetworks = (again = false) => (!networksLoad || again)
    ? (networksLoad = $fetch<NetworkSummaryDto[]>(`/api/projects/${projectId}/networks`).then((list) => { networks.value = list }, () => {}))
    : networksLoad

  /** The network a reference names: by id, else the first of that name (as the server resolves it). */
  function networkFor(ref: string): NetworkSummaryDto | undefined {
    return networks.value.find(n => n.id === ref) ?? networks.value.find(n => n.name === ref)
  }

  /**
   * Loads the documents the given one uses as sub-networks, and theirs in turn (each once: a chain
   * that comes back to itself stops loading there, and the solver names the cycle).
   */
  async function loadInner(document: NetworkDocument): Promise<void> {
    await loadNetworks()
    const queue = subnetworkRefs(document).filter(r => !inner.value.has(r))
    let added = false
    while (queue.length) {
      const ref = queue.shift()!
      if (inner.value.has(ref)) continue
      const summary = networkFor(ref)
      const doc = summary ? await $fetch<NetworkDto>(`/api/projects/${projectId}/networks/${summary.id}`).then(n => n.document, () => null) : null
      inner.value.set(ref, doc)
      added = true
      if (doc) queue.push(...subnetworkRefs(doc).filter(r => !inner.value.has(r)))
    }
    if (added) triggerRef(inner)
  }

  /** Forget the inner documents and lists, so the next solve reads them again (after edits elsewhere). */
  function refresh() {
    dataLoader = projectDataLoader(projectId)
    inner.value = new Map()
    filesLoad = null
    networksLoad = null
    void loadFiles()
  }

  /** Ports of a data or subnetwork block, when known. */
  function portsOf(block: { type: string, params: Record<string, unknown> }): ExternalPorts | undefined {
    const r = externalRef(block)
    if (!r) return undefined
    if (r.type === 'data') {
      const file = files.value.find(f => f.name === r.ref)
      return file ? { count: file.summary.ports } : undefined
    }
    const doc = inner.value.get(r.ref)
    return doc ? innerPorts(doc) : undefined
  }

  /** A file's S-parameters as the project holds it now (the inspector's preview). */
  const fileData = (file: StoredFileDto) => $fetch<StoredFileDataDto>(`/api/projects/${projectId}/files/${file.id}/data`)
  /** Data sets of data blocks by file name, for the solve worker; its file list is read afresh after each refresh. */
  const loadData = (name: string) => dataLoader(name)

  return { files, networks, inner, loadFiles, loadNetworks, loadInner, networkFor, refresh, portsOf, fileData, loadData, frozen: false }
}

export type ProjectParts = ReturnType<typeof createParts>
const instances = new Map<string, ProjectParts>()

/** Pages that show something frozen (a snapshot) provide its parts under this key; the editor's components then use them. */
export const frozenPartsKey: InjectionKey<ProjectParts> = Symbol('frozen project parts')

/** The shared parts state of a project (or the frozen parts a page above provides). */
export function useProjectParts(projectId: string): ProjectParts {
  const provided = getCurrentInstance() ? inject(frozenPartsKey, null) : null
  if (provided) return provided
  // On the server each request gets its own: nothing of one user's project stays for another.
  if (import.meta.server) return createParts(projectId)
  let parts = instances.get(projectId)
  if (!parts) instances.set(projectId, parts = createParts(projectId))
  return parts
}

/**
 * The parts of a snapshot as it froze them: its inner networks' documents by reference and its own
 * copies of the data files, in the same shape as the live `useProjectParts`, so the editor's canvas,
 * inspector and solve worker show and solve the snapshot exactly as it was frozen. Nothing here
 * reads the project's current networks or files; reading again changes nothing.
 */
import { shallowRef } from 'vue'
import type { NetworkDocument } from '~~/shared/network/types'
import type { NetworkSummaryDto, StoredFileDataDto, StoredFileDto } from '~~/shared/types/api'
import type { FrozenPartsDto } from '~~/shared/types/review'
import type { DataSet } from '~~/shared/solver/types'
import { externalRef, innerPorts, type ExternalPorts } from '~~/app/utils/editor/externalTerminals'
import type { ProjectParts } from '~~/app/composables/useProjectParts'

/** A snapshot's data-file copy as a data set for the solver. */
export function frozenDataLoader(projectId: string, snapshotId: string): (name: string) => Promise<DataSet | undefined> {
  return async (name) => {
    const data = await $fetch<StoredFileDataDto>(`/api/projects/${projectId}/snapshots/${snapshotId}/data`, { query: { file: name } }).catch(() => null)
    return data ? { ports: data.ports, impedances: data.impedances, frequencies: Float64Array.from(data.frequencies), re: Float64Array.from(data.re), im: Float64Array.from(data.im) } : undefined
  }
}

/** Parts that answer from a snapshot's frozen networks and files. */
export function frozenProjectParts(projectId: string, snapshotId: string, frozen: FrozenPartsDto): ProjectParts {
  const fileDtos: StoredFileDto[] = frozen.files.map(f => ({
    id: f.fileId ?? `frozen:${f.name}`, name: f.name, size: 0, version: f.version, summary: f.summary, uploadedBy: null, uploadedAt: '',
  }))
  const files = shallowRef(fileDtos)
  const networks = shallowRef<NetworkSummaryDto[]>([])
  const innerMap = new Map<string, NetworkDocument | null>(frozen.networks)
  const inner = shallowRef(innerMap)
  const loadData = frozenDataLoader(projectId, snapshotId)

  /** A reference the snapshot did not freeze stays unresolved (the solver names it), as it was when frozen. */
  async function loadInner(document: NetworkDocument): Promise<void> {
    for (const block of document.blocks ?? []) {
      const r = externalRef(block as { type: string, params: Record<string, unknown> })
      if (r?.type === 'subnetwork' && !inner.value.has(r.ref)) inner.value.set(r.ref, null)
    }
  }
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
  const done = async () => {}
  return {
    files,
    networks,
    inner,
    loadFiles: done,
    loadNetworks: done,
    loadInner,
    networkFor: () => undefined,
    refresh: () => {},
    portsOf,
    fileData: (file: StoredFileDto) => $fetch<StoredFileDataDto>(`/api/projects/${projectId}/snapshots/${snapshotId}/data`, { query: { file: file.name } }),
    loadData,
    frozen: true,
  }
}

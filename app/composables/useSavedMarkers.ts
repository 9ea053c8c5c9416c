/**
 * Keeps the plot markers and the document's `view.markers` in step: markers
 * placed or moved are written (after a pause, so a drag is one write) and
 * markers that arrive with the document (a load, a peer, undo) are shown.
 */
import { onBeforeUnmount, watch } from 'vue'
import { useEditorStore } from '~~/app/stores/editor'
import { sameFrequencies, saveMarkers, savedMarkerFrequencies } from '~~/app/utils/editor/savedMarkers'

const WRITE_AFTER_MS = 400

export function useSavedMarkers() {
  const store = useEditorStore()
  let timer: ReturnType<typeof setTimeout> | undefined
  /** Markers just taken from the document: showing them is not a change to write back. */
  let taken: string | null = null
  const local = () => store.results.markers.map(m => m.frequency)

  watch(() => store.version, () => {
    const saved = savedMarkerFrequencies(store.doc)
    if (!saved || sameFrequencies(saved, local())) return
    // A local change on its way wins over an edit of something else; a whole new document (a load) never waits.
    if (timer && store.lastOrigin !== 'replace') return
    clearTimeout(timer)
    timer = undefined
    taken = saved.join(',')
    store.setMarkers(saved)
  }, { immediate: true })

  watch(() => local().join(','), (key) => {
    if (key === taken) { taken = null; return }
    taken = null
    if (store.readOnly) return
    clearTimeout(timer)
    timer = setTimeout(() => {
      timer = undefined
      if (store.readOnly) return
      const frequencies = local()
      if (sameFrequencies(savedMarkerFrequencies(store.doc) ?? [], frequencies)) return
      store.edit(d => saveMarkers(d, frequencies), { mergeKey: 'view.markers' })
    }, WRITE_AFTER_MS)
  })
  onBeforeUnmount(() => clearTimeout(timer))
}

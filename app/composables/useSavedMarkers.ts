/**
 * Keeps the plot markers and the document's `view.markers` in step: markers
 * placed or moved are written (after a pause, so a drag is one write) and
 * markers that arrive with the document (a load, a peer) are shown.
 */
import { onBeforeUnmount, watch } from 'vue'
import { useEditorStore } from '~~/app/stores/editor'
import { sameFrequencies, saveMarkers, savedMarkerFrequencies } from '~~/app/utils/editor/savedMarkers'

const WRITE_AFTER_MS = 400

export function useSavedMarkers() {
  const store = useEditorStore()
  let timer: ReturnType<typeof setTimeout> | undefined
  const local = () => store.results.markers.map(m => m.frequency)

  watch(() => store.version, () => {
    if (timer) return // our own write is on its way
    const saved = savedMarkerFrequencies(store.doc)
    if (saved && !sameFrequencies(saved, local())) store.setMarkers(saved)
  }, { immediate: true })

  watch(() => local().join(','), () => {
    if (store.readOnly) return
    clearTimeout(timer)
    timer = setTimeout(() => {
      timer = undefined
      const frequencies = local()
      if (sameFrequencies(savedMarkerFrequencies(store.doc) ?? [], frequencies)) return
      store.edit(d => saveMarkers(d, frequencies), { mergeKey: 'view.markers' })
    }, WRITE_AFTER_MS)
  })
  onBeforeUnmount(() => clearTimeout(timer))
}

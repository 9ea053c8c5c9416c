/** Keyboard actions for frequency markers: place, remove and step them along the sweep. */
import type { ShallowRef } from 'vue'
import { useEditorStore } from '~~/app/stores/editor'
import { nearestIndex } from '~~/app/utils/editor/traces'
import type { SolvedData } from '~~/app/workers/protocol'

export function useMarkerKeys(result: ShallowRef<SolvedData | null>) {
  const store = useEditorStore()

  function step(by: number) {
    const f = result.value?.frequencies
    const m = store.results.markers.find(x => x.id === store.results.activeMarker)
    if (!f || !m) return
    const k = Math.min(f.length - 1, Math.max(0, nearestIndex(f, m.frequency) + by))
    store.moveMarker(m.id, f[k]!)
  }

  return {
    addMarker: () => {
      const f = result.value?.frequencies
      if (f?.length) store.addMarker(f[Math.floor((f.length - 1) / 2)]!)
    },
    removeMarker: () => { if (store.results.activeMarker !== null) store.removeMarker(store.results.activeMarker) },
    markerLeft: () => step(-1),
    markerRight: () => step(1),
    markerJumpLeft: () => step(-10),
    markerJumpRight: () => step(10),
  }
}

import { ref, shallowRef } from 'vue'
import type { YieldEnvelope } from '~~/app/utils/editor/envelopeFills'

// Written in the browser only (the yield run's workers), read by the Response view of the same network.
const kept = shallowRef<{ networkId: string; envelopes: YieldEnvelope[] } | null>(null)
const shown = ref(true)

/**
 * The trace spreads of the last yield run in this tab, for drawing on the Response view, and whether to draw
 * them. Kept per network: opening another network's editor shows none of these.
 */
export function useYieldEnvelopes() {
  return {
    shown,
    /** The kept envelopes when they belong to `networkId`. */
    of(networkId: string): YieldEnvelope[] {
      return kept.value?.networkId === networkId ? kept.value.envelopes : []
    },
    keep(networkId: string, envelopes: YieldEnvelope[]): void {
      kept.value = { networkId, envelopes }
    },
  }
}

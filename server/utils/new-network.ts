import type { NetworkDocument } from '#shared/network/types'

/** A valid, empty network document: no blocks yet, a sweep around 2.45 GHz. */
export function emptyNetworkDocument(name: string): NetworkDocument {
  return {
    format: 'portwright.network',
    version: 1,
    name,
    referenceImpedance: 50,
    variables: { f0: '2.45 GHz' },
    sweep: { start: '1.5 GHz', stop: '3.5 GHz', points: 201, spacing: 'linear' },
    blocks: [],
    wires: [],
  } as NetworkDocument
}

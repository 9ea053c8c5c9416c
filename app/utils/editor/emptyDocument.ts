import type { NetworkDocument } from '~~/shared/network/types'

/** A blank, valid-shaped document: the starting point before anything loads. */
export function emptyDocument(name: string): NetworkDocument {
  return {
    format: 'portwright.network',
    version: 1,
    name,
    referenceImpedance: 50,
    variables: {},
    sweep: { start: '0.5 GHz', stop: '1.5 GHz', points: 201, spacing: 'linear' },
    blocks: [],
    wires: [],
  } as NetworkDocument
}

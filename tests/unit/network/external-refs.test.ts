import { describe, expect, it } from 'vitest'
import { dataFileReferences, subnetworkReferences } from '../../../shared/network/external-refs'

const blocks = [
  { id: 'P1', type: 'port', params: { index: 1 } },
  { id: 'SN1', type: 'subnetwork', params: { network: 'Inner pad' } },
  { id: 'SN2', type: 'subnetwork', params: { network: 'Inner pad' } },
  { id: 'SN3', type: 'subnetwork', params: { network: 'Other' } },
  { id: 'SN4', type: 'subnetwork', params: { network: 42 } },
  { id: 'SN5', type: 'subnetwork', params: {} },
  { id: 'DA1', type: 'data', params: { file: 'amp.s2p' } },
  { id: 'DA2', type: 'data', params: { file: '' } },
  { id: 'LD1', type: 'load', params: { file: 'not-a-data-block.s1p' } },
]

describe('references a document makes to other parts of its project', () => {
  it('lists each sub-network reference once, in block order, skipping non-text and empty ones', () => {
    expect(subnetworkReferences({ blocks } as never)).toEqual(['Inner pad', 'Other'])
  })

  it('lists the data files of several documents once each, only from data blocks', () => {
    const second = { blocks: [{ id: 'DA9', type: 'data', params: { file: 'pad.s2p' } }, { id: 'DA8', type: 'data', params: { file: 'amp.s2p' } }] }
    expect(dataFileReferences([{ blocks } as never, second as never])).toEqual(['amp.s2p', 'pad.s2p'])
  })

  it('tolerates a document without blocks or params (hostile input is not trusted to be complete)', () => {
    expect(subnetworkReferences({} as never)).toEqual([])
    expect(dataFileReferences([{ blocks: [{ id: 'X', type: 'data' }] } as never])).toEqual([])
  })
})

import { describe, expect, it } from 'vitest'
import { colourFor, initialsOf, peersFrom, selectionsByBlock } from '../../../app/utils/editor/presence'

describe('presence', () => {
  it('makes initials from first and last name, or the first two letters of one word', () => {
    expect(initialsOf('Ines Okafor-Lund')).toBe('IO')
    expect(initialsOf('  tomas  reyvik ')).toBe('TR')
    expect(initialsOf('Priya Anne Castellane')).toBe('PC')
    expect(initialsOf('jun')).toBe('JU')
    expect(initialsOf('')).toBe('?')
  })

  it('gives one user the same colour every time and spreads users over the palette', () => {
    expect(colourFor('a1b2')).toBe(colourFor('a1b2'))
    const colours = new Set(Array.from({ length: 40 }, (_, i) => colourFor(`user-${i}`)))
    expect(colours.size).toBeGreaterThanOrEqual(4)
    expect(colours.has('rgb(240, 228, 66)')).toBe(false)
  })

  it('lists others only, with server-stamped identities, and maps selections to blocks', () => {
    const states = new Map<number, Record<string, unknown>>([
      [1, { user: { id: 'me', name: 'Me Myself' }, selection: ['A'] }],
      [2, { user: { id: 'u2', name: 'Tomas Reyvik', role: 'editor' }, selection: ['A', 'B', 7] }],
      [3, { selection: ['C'] }],
      [4, { user: { id: 'u4', name: 'Ines Okafor-Lund', role: 'owner' } }],
    ])
    const peers = peersFrom(states, 1)
    expect(peers.map(p => p.initials)).toEqual(['IO', 'TR'])
    expect(peers[1]!.selection).toEqual(['A', 'B'])
    const byBlock = selectionsByBlock(peers)
    expect(Object.keys(byBlock).sort()).toEqual(['A', 'B'])
    expect(byBlock.A!.map(p => p.userId)).toEqual(['u2'])
  })
})

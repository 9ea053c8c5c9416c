import { describe, expect, it } from 'vitest'
import { findUnmatchedMentions } from '../../../shared/review/mentions'

const members = [
  { id: 'u-tomas', email: 'tomas@quillmere.example' },
  { id: 'u-priya', email: 'priya@quillmere.example' },
  { id: 'u-jun-a', email: 'jun@quillmere.example' },
  { id: 'u-jun-b', email: 'jun@elsewhere.example' },
]

describe('mentions that reach nobody', () => {
  it('names a handle no member has, once, as typed', () => {
    expect(findUnmatchedMentions('@Nobody look; @tomas fine; again @nobody.', members)).toEqual([{ handle: '@Nobody', reason: 'nobody' }])
  })

  it('names a short handle several members share, and an address no member uses', () => {
    expect(findUnmatchedMentions('@jun and @ghost@quillmere.example', members)).toEqual([
      { handle: '@jun', reason: 'several' },
      { handle: '@ghost@quillmere.example', reason: 'nobody' },
    ])
  })

  it('reports nothing when every mention matches one member, and ignores addresses written without a mention', () => {
    expect(findUnmatchedMentions('@priya and @jun@elsewhere.example; mail lab@quillmere.example', members)).toEqual([])
  })
})

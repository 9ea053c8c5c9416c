import { describe, expect, it } from 'vitest'
import { findMentions, mentionHandle } from '../../../shared/review/mentions'

const members = [
  { id: 'u-priya', email: 'priya@quillmere.example' },
  { id: 'u-tomas', email: 'tomas@quillmere.example' },
  { id: 'u-jun-a', email: 'jun@quillmere.example' },
  { id: 'u-jun-b', email: 'jun@elsewhere.example' },
]

describe('mentions', () => {
  it('finds short and full handles in order of first mention, once each', () => {
    expect(findMentions('@tomas please check T12; @priya@quillmere.example too. Thanks @tomas.', members)).toEqual(['u-tomas', 'u-priya'])
  })

  it('ignores e-mail addresses in running text, unknown names and ambiguous short handles', () => {
    expect(findMentions('mail lab@quillmere.example or @nobody; @jun is two people', members)).toEqual([])
    expect(findMentions('@jun@elsewhere.example', members)).toEqual(['u-jun-b'])
  })

  it('offers the short handle only when it is unambiguous', () => {
    expect(mentionHandle(members[0]!, members)).toBe('@priya')
    expect(mentionHandle(members[3]!, members)).toBe('@jun@elsewhere.example')
  })
})

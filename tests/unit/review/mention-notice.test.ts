import { describe, expect, it } from 'vitest'
import { mentionNotice } from '../../../app/utils/review/mention-notice'

describe('the comment form\'s notice of mentions that reached nobody', () => {
  it('says nothing when every mention matched', () => {
    expect(mentionNotice([])).toBe('')
    expect(mentionNotice(undefined)).toBe('')
  })
  it('names the handles that are not members and those that fit several', () => {
    expect(mentionNotice([{ handle: '@ghost', reason: 'nobody' }])).toBe('Posted, but @ghost is not a member of this project, so nobody was told.')
    expect(mentionNotice([{ handle: '@a', reason: 'nobody' }, { handle: '@b', reason: 'nobody' }, { handle: '@jun', reason: 'several' }]))
      .toBe('Posted, but @a, @b are not members of this project, so nobody was told; @jun fits more than one member; mention them by full e-mail address.')
  })
})

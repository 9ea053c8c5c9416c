import { describe, expect, it } from 'vitest'
import { maskEmail } from '../../../shared/account/mask-email'
import { describeUserAgent } from '../../../shared/account/describe-user-agent'

describe('maskEmail', () => {
  it('keeps the first and last letter of the mailbox and the whole domain', () => {
    expect(maskEmail('newcomer@quillmere.example')).toBe('n•••r@quillmere.example')
  })
  it('shows only the first letter of a short mailbox, so nothing is given away', () => {
    expect(maskEmail('ada@quillmere.example')).toBe('a•••@quillmere.example')
    expect(maskEmail('j@quillmere.example')).toBe('j•••@quillmere.example')
  })
  it('never returns the address unmasked, even when it is malformed', () => {
    expect(maskEmail('no-at-sign')).toBe('•••')
    expect(maskEmail('@domain.example')).toBe('•••')
  })
})

describe('describeUserAgent', () => {
  // Header values as the browsers send them, common practice [memory].
  it('names the browser and system', () => {
    expect(describeUserAgent('Mozilla/5.0 (X11; Linux x86_64; rv:128.0) Gecko/20100101 Firefox/128.0')).toBe('Firefox on Linux')
    expect(describeUserAgent('Mozilla/5.0 (Windows NT 10.0; Win64; x64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/131.0.0.0 Safari/537.36 Edg/131.0.0.0')).toBe('Edge on Windows')
    expect(describeUserAgent('Mozilla/5.0 (Macintosh; Intel Mac OS X 14_5) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.5 Safari/605.1.15')).toBe('Safari on macOS')
    expect(describeUserAgent('Mozilla/5.0 (Linux; Android 14; Pixel 8) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/131.0.0.0 Mobile Safari/537.36')).toBe('Chrome on Android')
    expect(describeUserAgent('Mozilla/5.0 (iPhone; CPU iPhone OS 17_5 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.5 Mobile/15E148 Safari/604.1')).toBe('Safari on iOS')
  })
  it('falls back to a trimmed header, or says it does not know', () => {
    expect(describeUserAgent('')).toBe('Unknown browser')
    expect(describeUserAgent('SomeTool/1.0')).toBe('SomeTool/1.0')
    expect(describeUserAgent('x'.repeat(100))).toHaveLength(58)
  })
})

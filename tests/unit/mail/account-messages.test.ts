import { describe, expect, it } from 'vitest'
import { passwordChangedMail, passwordResetMail } from '../../../server/mail/messages'

const url = 'http://127.0.0.1:3000/password-reset/AAAA'
const when = new Date('2026-12-02T14:00:00Z')

describe('account mail', () => {
  it('a reset link says how long it works and what it does, in both bodies', () => {
    const m = passwordResetMail({ name: 'Nell', url, expiresAt: new Date('2026-12-02T14:30:00Z') })
    expect(m.subject).toBe('Set a new Portwright password')
    for (const body of [m.text, m.html]) {
      expect(body).toContain('Wed, 02 Dec 2026 14:30:00 GMT')
      expect(body).toContain('signs out every browser')
      expect(body).toContain('ignore this message')
    }
    expect(m.text).toContain(url)
    expect(m.html).toContain(`href="${url}"`)
  })

  it('a change notice says whether it came from the account page or a reset link, and where to act if it was not you', () => {
    const changed = passwordChangedMail({ name: 'Nell', how: 'changed', when, resetUrl: 'http://x.example/password-reset' })
    expect(changed.subject).toBe('Your Portwright password was changed')
    expect(changed.text).toContain('changed on the account page on Wed, 02 Dec 2026 14:00:00 GMT. Every other browser')
    expect(changed.text).toContain('http://x.example/password-reset')
    const reset = passwordChangedMail({ name: 'Nell', how: 'reset', when, resetUrl: 'http://x.example/password-reset' })
    expect(reset.text).toContain('set with a reset link')
    expect(reset.html).toContain('href="http://x.example/password-reset"')
  })

  it('escapes the account name in the HTML body', () => {
    const m = passwordResetMail({ name: '<b onmouseover=x>Eve', url, expiresAt: when })
    expect(m.html).not.toContain('<b onmouseover')
    expect(m.html).toContain('&lt;b onmouseover=x&gt;Eve')
    expect(m.text).toContain('Hello <b onmouseover=x>Eve,')
  })
})

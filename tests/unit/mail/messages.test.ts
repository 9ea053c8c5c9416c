import { describe, expect, it } from 'vitest'
import { decisionMail, invitationMail, mentionMail, reviewRequestedMail } from '../../../server/mail/messages'
import { RF_SAFETY_CAUTION } from '../../../shared/review/summary-lines'

const url = 'http://127.0.0.1:3000/projects/p/snapshots/n/s'

describe('mail messages', () => {
  it('every message carries its link in both bodies', () => {
    const all = [
      invitationMail({ inviterName: 'Ines', projectName: 'Feed', role: 'reviewer', url, expiresAt: new Date('2026-12-08T00:00:00Z') }),
      reviewRequestedMail({ requesterName: 'Tomas', projectName: 'Feed', networkName: 'Matrix', snapshotTitle: 'Rev B', message: '', summary: ['a'], url }),
      mentionMail({ authorName: 'Priya', projectName: 'Feed', snapshotTitle: 'Rev B', where: 'block T12', body: 'hi', url }),
      decisionMail({ deciderName: 'Priya', decision: 'clear', note: '', snapshotTitle: 'Rev B', projectName: 'Feed', state: 'cleared', url }),
    ]
    for (const m of all) {
      expect(m.text).toContain(url)
      expect(m.html).toContain(`href="${url}"`)
    }
  })

  it('escapes what users typed in the HTML body but keeps it as typed in the text body', () => {
    const m = mentionMail({ authorName: 'Eve <script>', projectName: 'P&Q', snapshotTitle: '"T"', where: 'block T12', body: '<img src=x onerror=alert(1)>', url })
    expect(m.html).not.toContain('<img')
    expect(m.html).not.toContain('<script>')
    expect(m.html).toContain('&lt;img src=x onerror=alert(1)&gt;')
    expect(m.text).toContain('> <img src=x onerror=alert(1)>')
  })

  it('a review request presents results, so it carries the RF-safety caution; a decision does not present results', () => {
    const request = reviewRequestedMail({ requesterName: 'Tomas', projectName: 'Feed', networkName: 'Matrix', snapshotTitle: 'Rev B', message: 'Look at the match', summary: ['Return loss: port 1 30.00 dB'], url })
    expect(request.text).toContain(RF_SAFETY_CAUTION)
    expect(request.text).toContain('  Return loss: port 1 30.00 dB')
    expect(request.text).toContain('> Look at the match')
    const decision = decisionMail({ deciderName: 'Priya', decision: 'send-back', note: 'S11 too high', snapshotTitle: 'Rev B', projectName: 'Feed', state: 'sent-back', url })
    expect(decision.subject).toBe('Priya sent the design back: “Rev B”')
    expect(decision.text).toContain('The review is now: Sent back for rework.')
  })
})

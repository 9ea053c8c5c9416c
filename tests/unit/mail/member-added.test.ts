import { describe, expect, it } from 'vitest'
import { memberAddedMail } from '../../../server/mail/messages'

const url = 'http://127.0.0.1:3000/projects/p-1'

describe('notice of being added to a project', () => {
  it('names who added whom to which project with which role, and links to the project in both bodies', () => {
    const m = memberAddedMail({ adderName: 'Ines Harrow', projectName: 'Feed study', role: 'reviewer', url })
    expect(m.subject).toBe('You were added to “Feed study” on Portwright')
    expect(m.text).toContain('Ines Harrow added you to the project “Feed study” on Portwright as reviewer')
    expect(m.text).toContain('decide on reviews you are asked for')
    expect(m.text).toContain(`Open the project: ${url}`)
    expect(m.html).toContain(`href="${url}"`)
    expect(m.html).toContain('<strong>reviewer</strong>')
  })

  it('says what each role may do, so a viewer is not told they can edit', () => {
    expect(memberAddedMail({ adderName: 'A', projectName: 'P', role: 'viewer', url }).text).toContain('you can read its networks, snapshots and reviews')
    expect(memberAddedMail({ adderName: 'A', projectName: 'P', role: 'viewer', url }).text).not.toContain('change its networks')
    expect(memberAddedMail({ adderName: 'A', projectName: 'P', role: 'editor', url }).text).toContain('change its networks')
  })

  it('escapes the names users typed in the HTML body and keeps them as typed in the text body', () => {
    const m = memberAddedMail({ adderName: 'Eve <script>', projectName: 'P&Q "x"', role: 'owner', url })
    expect(m.html).not.toContain('<script>')
    expect(m.html).toContain('Eve &lt;script&gt;')
    expect(m.html).toContain('P&amp;Q &quot;x&quot;')
    expect(m.text).toContain('Eve <script> added you to the project “P&Q "x"”')
  })
})

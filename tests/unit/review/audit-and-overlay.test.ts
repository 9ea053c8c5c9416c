import { describe, expect, it } from 'vitest'
import { describeAuditEvent } from '../../../app/utils/review/audit'
import { faded, overlaySeries } from '../../../app/utils/review/overlay'
import type { AuditEventDto } from '../../../shared/types/review'

const event = (action: string, detail: Record<string, unknown>, subject: AuditEventDto['subject'] = null): AuditEventDto =>
  ({ id: 1, action, detail, actor: null, subject, createdAt: '2026-12-01T10:00:00Z' })

describe('audit events in words', () => {
  it('names the member a role change is about, and both roles', () => {
    const jun = { id: 'u', name: 'Jun Marlowe', email: 'jun@quillmere.example' }
    expect(describeAuditEvent(event('member.role-changed', { userId: 'u', from: 'viewer', to: 'reviewer' }, jun))).toBe('changed Jun Marlowe\'s role from viewer to reviewer')
  })

  it('says what a review decision did to the review', () => {
    expect(describeAuditEvent(event('review.decided', { decision: 'send-back', state: 'sent-back', title: 'Rev B' })))
      .toBe('sent the design back in the review of “Rev B”; it is now sent back for rework')
  })

  it('tells an accepted invitation that changed nothing from one that added a member', () => {
    expect(describeAuditEvent(event('invitation.accepted', { email: 'a@x.example', role: 'editor', alreadyMember: false }))).toBe('joined as editor with the invitation sent to a@x.example')
    expect(describeAuditEvent(event('invitation.accepted', { email: 'a@x.example', role: 'viewer', alreadyMember: true }))).toMatch(/already a member, role unchanged/)
  })

  it('falls back to the action name for events it has no words for', () => {
    expect(describeAuditEvent(event('something.new', {}))).toBe('something.new')
  })
})

describe('overlaid responses', () => {
  const flat = (value: number) => ({ ports: 2, impedances: [50, 50], frequencies: new Float64Array([1e9, 2e9]), re: new Float64Array(8).fill(value), im: new Float64Array(8) })

  it('fades the before trace in the same palette colour as the after trace', () => {
    expect(faded('rgb(230, 159, 0)')).toBe('rgba(230, 159, 0, 0.4)')
    const series = overlaySeries(flat(0.1), flat(0.5), ['S11', 'S21'], 'db')
    expect(series.map(s => s.label)).toEqual(['S11 before', 'S11 after', 'S21 before', 'S21 after'])
    expect(series[0]!.colour).toBe(faded(series[1]!.colour))
    expect(series[2]!.colour).not.toBe(series[0]!.colour)
    // |0.1| is −20 dB, |0.5| is −6.02 dB (20·log10).
    expect(series[0]!.values[0]).toBeCloseTo(-20, 9)
    expect(series[1]!.values[0]).toBeCloseTo(-6.0206, 4)
  })

  it('leaves out a trace a side does not have (fewer ports before than after)', () => {
    const four = { ...flat(0.1), ports: 4, re: new Float64Array(32).fill(0.1), im: new Float64Array(32) }
    expect(overlaySeries(flat(0.1), four, ['S31'], 'db').map(s => s.label)).toEqual(['S31 after'])
  })
})

import { beforeAll, describe, expect, it } from 'vitest'
import { branchLineHybrid } from '../../shared/examples/index'
import { RF_SAFETY_CAUTION } from '../../shared/review/summary-lines'
import { newSignedInUser, type ApiClient } from '../support/http'
import { mailDuring } from '../support/mail'

type Person = Awaited<ReturnType<typeof newSignedInUser>>
let owner: Person, editor: Person, r1: Person, r2: Person, viewer: Person
let everyone: string[]
let projectId: string
let networkId: string
let base: string

async function saveDocument(client: ApiClient, change: (d: typeof branchLineHybrid) => void) {
  const current = await client.get(`${base}/networks/${networkId}`)
  const document = structuredClone(current.body.document)
  change(document)
  const answer = await client.put(`${base}/networks/${networkId}`, { revision: current.body.revision, document })
  expect(answer.status, JSON.stringify(answer.body)).toBe(200)
  return answer.body
}

async function snapshot(title: string) {
  const answer = await editor.client.post(`${base}/networks/${networkId}/snapshots`, { title, note: 'for the bench' })
  expect(answer.status, JSON.stringify(answer.body)).toBe(201)
  return answer.body
}

beforeAll(async () => {
  owner = await newSignedInUser('Odile Owner')
  editor = await newSignedInUser('Eamon Editor')
  r1 = await newSignedInUser('Rhea Reviewer')
  r2 = await newSignedInUser('Ravi Reviewer')
  viewer = await newSignedInUser('Vera Viewer')
  everyone = [owner, editor, r1, r2, viewer].map(p => p.email)
  projectId = (await owner.client.post('/api/projects', { name: 'Review bench' })).body.id
  base = `/api/projects/${projectId}`
  for (const [p, role] of [[editor, 'editor'], [r1, 'reviewer'], [r2, 'reviewer'], [viewer, 'viewer']] as const) {
    await owner.client.post(`${base}/members`, { email: p.email, role })
  }
  networkId = (await editor.client.post(`${base}/networks`, { name: 'Hybrid under review', document: branchLineHybrid })).body.id
})

describe('snapshots', () => {
  it('freeze the saved document with a solver summary, author and time', async () => {
    const made = await snapshot('Rev A')
    expect(made.title).toBe('Rev A')
    expect(made.author.name).toBe('Eamon Editor')
    expect(made.summary.solved).toBe(true)
    expect(made.summary.centre.frequency).toBe(2.45e9)
    expect(made.document.blocks).toHaveLength(branchLineHybrid.blocks.length)
    const list = await viewer.client.get(`${base}/networks/${networkId}/snapshots`)
    expect(list.body.map((s: { id: string }) => s.id)).toContain(made.id)
    expect(list.body[0]).not.toHaveProperty('document')
  })

  it('freeze the document\'s spec (contract 1.1) and report the band it meets', async () => {
    // The one-section branch-line meets 20 dB return loss over roughly ±5 % of f0 (common practice); the spec's
    // own band is narrower, so the summary must find a band that contains it.
    await saveDocument(editor.client, (d) => {
      d.version = 1.1
      d.spec = { center: 'f0', band: { start: '2.4 GHz', stop: '2.5 GHz' }, conditions: [{ measure: 'returnLoss', port: 1, min: 20 }] }
    })
    const made = await snapshot('With its spec')
    expect(made.document.spec.center).toBe('f0')
    expect(made.summary.centre).toEqual({ frequency: 2.45e9, from: 'spec' })
    expect(made.summary.bandwidth.ok).toBe(true)
    expect(made.summary.bandwidth.low).toBeLessThan(2.4e9)
    expect(made.summary.bandwidth.high).toBeGreaterThan(2.5e9)
    await saveDocument(editor.client, (d) => { delete d.spec; d.version = 1 })
  })

  it('stay as frozen when the network changes afterwards', async () => {
    const made = await snapshot('Before the change')
    await saveDocument(editor.client, (d) => { d.blocks.find(b => b.id === 'T12')!.params.impedance = 36 })
    const again = await viewer.client.get(`${base}/snapshots/${made.id}`)
    expect(again.body.document.blocks.find((b: { id: string }) => b.id === 'T12').params.impedance).toBe('Z0/sqrt(2)')
  })

  it('refuse to freeze a revision other than the live one, and reviewers may not freeze', async () => {
    const stale = await editor.client.post(`${base}/networks/${networkId}/snapshots`, { title: 'Old', revision: 1 })
    expect(stale.status).toBe(409)
    expect(stale.body.message).toMatch(/has changed since revision 1/)
    expect((await r1.client.post(`${base}/networks/${networkId}/snapshots`, { title: 'Mine' })).status).toBe(403)
    expect((await editor.client.post(`${base}/networks/${networkId}/snapshots`, { title: '  ' })).status).toBe(400)
  })

  it('compare with the live network: the changed parameter, and nothing else', async () => {
    const made = await snapshot('Compare base')
    await saveDocument(editor.client, (d) => {
      d.blocks.find(b => b.id === 'BR14')!.params.impedance = 52
    })
    const compared = await viewer.client.get(`${base}/snapshots/${made.id}/compare?with=live`)
    expect(compared.status, JSON.stringify(compared.body)).toBe(200)
    expect(compared.body.after.kind).toBe('live')
    expect(compared.body.diff.entries).toEqual([{ area: 'parameter', change: 'changed', subject: 'BR14.impedance', before: 'Z0', after: '52' }])
    const later = await snapshot('Compare later')
    const between = await viewer.client.get(`${base}/snapshots/${made.id}/compare?with=${later.id}`)
    expect(between.body.diff.entries).toEqual(compared.body.diff.entries)
    expect((await viewer.client.get(`${base}/snapshots/${made.id}/compare?with=nonsense`)).status).toBe(400)
  })

  it('restore as the live network through the revision check, keeping what it replaced', async () => {
    const made = await snapshot('To come back to')
    const changed = await saveDocument(editor.client, (d) => { d.variables!.f0 = '2.4 GHz' })
    const stale = await editor.client.post(`${base}/snapshots/${made.id}/restore`, { revision: changed.revision - 1 })
    expect(stale.status).toBe(409)
    expect((await editor.client.get(`${base}/networks/${networkId}`)).body.document.variables.f0).toBe('2.4 GHz')

    const restored = await editor.client.post(`${base}/snapshots/${made.id}/restore`, { revision: changed.revision })
    expect(restored.status, JSON.stringify(restored.body)).toBe(200)
    expect(restored.body.revision).toBe(changed.revision + 1)
    const live = (await editor.client.get(`${base}/networks/${networkId}`)).body
    expect(live.document.variables.f0).toBe('2.45 GHz')
    expect(live.revision).toBe(changed.revision + 1)
    const kept = (await editor.client.get(`${base}/snapshots/${restored.body.keptAsSnapshotId}`)).body
    expect(kept.document.variables.f0).toBe('2.4 GHz')
    expect(kept.title).toBe('Before restoring “To come back to”')
    expect((await r1.client.post(`${base}/snapshots/${made.id}/restore`, { revision: live.revision })).status).toBe(403)
  })
})

describe('reviews, comments and their e-mail', () => {
  let snap: { id: string; title: string }
  let reviewId: string

  it('a review request mails exactly the chosen reviewers, with the key figures and the RF-safety caution', async () => {
    snap = await snapshot('Rev B for review')
    let answer: Awaited<ReturnType<ApiClient['post']>> | undefined
    const mail = await mailDuring(everyone, async () => {
      answer = await editor.client.post(`${base}/snapshots/${snap.id}/reviews`, { reviewerIds: [r1.id, r2.id], message: 'Check the match at 2.45 GHz.' })
    })
    expect(answer!.status, JSON.stringify(answer!.body)).toBe(201)
    reviewId = answer!.body.id
    expect(answer!.body.state).toBe('awaiting')
    expect(mail.map(m => m.to).sort()).toEqual([[r1.email], [r2.email]].sort())
    for (const m of mail) {
      expect(m.subject).toBe('Your review, please: “Rev B for review” (Review bench)')
      expect(m.text).toContain('Eamon Editor froze “Rev B for review” of the network “Hybrid under review”')
      expect(m.text).toContain('> Check the match at 2.45 GHz.')
      expect(m.text).toContain('Balance S21/S31:')
      expect(m.text).toContain(RF_SAFETY_CAUTION)
      expect(m.text).toContain(`/projects/${projectId}/snapshots/${networkId}/${snap.id}`)
    }
  })

  it('refuses reviewers who cannot decide, a second open review, and requests from reviewers', async () => {
    const other = await snapshot('Rev C')
    const withViewer = await editor.client.post(`${base}/snapshots/${other.id}/reviews`, { reviewerIds: [viewer.id] })
    expect(withViewer.status).toBe(400)
    expect(withViewer.body.message).toMatch(/Vera Viewer is a viewer and cannot decide/)
    const outsider = await newSignedInUser('Not in it')
    expect((await editor.client.post(`${base}/snapshots/${other.id}/reviews`, { reviewerIds: [outsider.id] })).status).toBe(400)
    expect((await editor.client.post(`${base}/snapshots/${snap.id}/reviews`, { reviewerIds: [r1.id] })).status).toBe(409)
    expect((await r1.client.post(`${base}/snapshots/${other.id}/reviews`, { reviewerIds: [r2.id] })).status).toBe(403)
  })

  it('a comment on a block mails exactly the member it mentions', async () => {
    let answer: Awaited<ReturnType<ApiClient['post']>> | undefined
    const handle = editor.email.split('@')[0]
    const mail = await mailDuring(everyone, async () => {
      answer = await r1.client.post(`${base}/snapshots/${snap.id}/comments`, { body: `@${handle} is T12 at Z0/√2 on purpose?`, anchor: { kind: 'block', blockId: 'T12' } })
    })
    expect(answer!.status, JSON.stringify(answer!.body)).toBe(201)
    expect(answer!.body.anchor).toEqual({ kind: 'block', blockId: 'T12' })
    expect(answer!.body.mentions.map((p: { id: string }) => p.id)).toEqual([editor.id])
    expect(mail).toHaveLength(1)
    expect(mail[0]!.to).toEqual([editor.email])
    expect(mail[0]!.subject).toBe('Rhea Reviewer mentioned you on “Rev B for review”')
    expect(mail[0]!.text).toContain('on block T12 of the snapshot')
    expect(mail[0]!.text).toContain(`?focus=${answer!.body.id}`)
  })

  it('threads: band anchors, replies, own-edit only, resolve and reopen; an edit mails only the newly mentioned', async () => {
    const band = await r2.client.post(`${base}/snapshots/${snap.id}/comments`, { body: 'Isolation is thin up here.', anchor: { kind: 'band', low: 2.6e9, high: 2.8e9 } })
    expect(band.status).toBe(201)
    expect(band.body.anchor).toEqual({ kind: 'band', low: 2.6e9, high: 2.8e9 })
    expect((await r2.client.post(`${base}/snapshots/${snap.id}/comments`, { body: 'x', anchor: { kind: 'band', low: 3e9, high: 2e9 } })).status).toBe(400)
    expect((await r2.client.post(`${base}/snapshots/${snap.id}/comments`, { body: 'x', anchor: { kind: 'block', blockId: 'NOPE' } })).status).toBe(400)
    expect((await viewer.client.post(`${base}/snapshots/${snap.id}/comments`, { body: 'may I?' })).status).toBe(403)

    const reply = await editor.client.post(`${base}/snapshots/${snap.id}/comments`, { body: 'Agreed, widening BR23.', parentId: band.body.id })
    expect(reply.body.parentId).toBe(band.body.id)
    expect(reply.body.anchor).toEqual(band.body.anchor)
    expect((await r1.client.post(`${base}/snapshots/${snap.id}/comments`, { body: 'nested', parentId: reply.body.id })).status).toBe(400)

    expect((await r1.client.patch(`${base}/comments/${band.body.id}`, { body: 'not mine' })).status).toBe(403)
    const mentionR1 = `@${r1.email}`
    const mail = await mailDuring(everyone, async () => {
      const edited = await r2.client.patch(`${base}/comments/${band.body.id}`, { body: `Isolation is thin up here. ${mentionR1}` })
      expect(edited.body.edited).toBe(true)
    })
    expect(mail.map(m => m.to)).toEqual([[r1.email]])
    const unchanged = await mailDuring(everyone, () => r2.client.patch(`${base}/comments/${band.body.id}`, { body: `Isolation is thin up here, ${mentionR1}` }))
    expect(unchanged).toEqual([])

    const resolved = await r1.client.patch(`${base}/comments/${band.body.id}`, { resolved: true })
    expect(resolved.body.resolvedBy.id).toBe(r1.id)
    expect((await editor.client.patch(`${base}/comments/${reply.body.id}`, { resolved: true })).status).toBe(400)
    const reopened = await editor.client.patch(`${base}/comments/${band.body.id}`, { resolved: false })
    expect(reopened.body.resolvedAt).toBeNull()

    const all = await viewer.client.get(`${base}/snapshots/${snap.id}/comments`)
    expect(all.body.map((c: { body: string }) => c.body)).toEqual([
      `@${editor.email.split('@')[0]} is T12 at Z0/√2 on purpose?`, `Isolation is thin up here, ${mentionR1}`, 'Agreed, widening BR23.',
    ])
  })

  it('decisions: each mails exactly the requester and the other reviewers; one send-back settles the review', async () => {
    expect((await viewer.client.post(`${base}/reviews/${reviewId}/decision`, { decision: 'clear' })).status).toBe(403)
    expect((await owner.client.post(`${base}/reviews/${reviewId}/decision`, { decision: 'clear' })).status).toBe(403)

    let first: Awaited<ReturnType<ApiClient['post']>> | undefined
    const mail1 = await mailDuring(everyone, async () => { first = await r1.client.post(`${base}/reviews/${reviewId}/decision`, { decision: 'clear', note: 'Match is fine.' }) })
    expect(first!.status, JSON.stringify(first!.body)).toBe(200)
    expect(first!.body.state).toBe('awaiting')
    expect(mail1.map(m => m.to[0]).sort()).toEqual([editor.email, r2.email].sort())
    expect(mail1[0]!.subject).toBe('Rhea Reviewer cleared the design: “Rev B for review”')
    expect(mail1[0]!.text).toContain('The review is now: Awaiting reviewers.')
    expect((await r1.client.post(`${base}/reviews/${reviewId}/decision`, { decision: 'send-back' })).status).toBe(409)

    let second: Awaited<ReturnType<ApiClient['post']>> | undefined
    const mail2 = await mailDuring(everyone, async () => { second = await r2.client.post(`${base}/reviews/${reviewId}/decision`, { decision: 'send-back', note: 'Isolation above 2.6 GHz.' }) })
    expect(second!.body.state).toBe('sent-back')
    expect(mail2.map(m => m.to[0]).sort()).toEqual([editor.email, r1.email].sort())
    expect(mail2[0]!.text).toContain('The review is now: Sent back for rework.')
    expect(second!.body.history.map((h: { kind: string }) => h.kind)).toEqual(['requested', 'clear', 'send-back'])
    expect(second!.body.reviewers.map((r: { decision: string }) => r.decision).sort()).toEqual(['clear', 'send-back'])

    const listed = await viewer.client.get(`${base}/networks/${networkId}/snapshots`)
    expect(listed.body.find((s: { id: string }) => s.id === snap.id).latestReview).toEqual({ id: reviewId, state: 'sent-back' })
    // Two threads (the block one and the reopened band one), both open; replies are not threads.
    expect(listed.body.find((s: { id: string }) => s.id === snap.id).openComments).toBe(2)
  })

  it('all reviewers clearing clears the review; a review can be withdrawn while awaiting', async () => {
    const next = await snapshot('Rev D')
    const review = (await editor.client.post(`${base}/snapshots/${next.id}/reviews`, { reviewerIds: [r1.id, r2.id] })).body
    await r1.client.post(`${base}/reviews/${review.id}/decision`, { decision: 'clear' })
    const done = await r2.client.post(`${base}/reviews/${review.id}/decision`, { decision: 'clear' })
    expect(done.body.state).toBe('cleared')
    expect(done.body.closedAt).not.toBeNull()
    expect((await editor.client.post(`${base}/reviews/${review.id}/withdraw`, {})).status).toBe(409)

    const another = await snapshot('Rev E')
    const open = (await editor.client.post(`${base}/snapshots/${another.id}/reviews`, { reviewerIds: [r1.id] })).body
    const mail = await mailDuring(everyone, async () => {
      const withdrawn = await editor.client.post(`${base}/reviews/${open.id}/withdraw`, { note: 'Found a mistake first.' })
      expect(withdrawn.body.state).toBe('withdrawn')
    })
    expect(mail).toEqual([])
    expect((await r1.client.post(`${base}/reviews/${open.id}/decision`, { decision: 'clear' })).status).toBe(409)
  })

  it('snapshots, restores, requests and decisions land in the audit trail, which only owners read', async () => {
    const audit = await owner.client.get(`${base}/audit`)
    const actions = new Set(audit.body.map((e: { action: string }) => e.action))
    for (const a of ['snapshot.created', 'snapshot.restored', 'review.requested', 'review.decided', 'review.withdrawn']) expect(actions).toContain(a)
    expect(audit.body[0].actor).toMatchObject({ name: expect.any(String) })
    expect((await editor.client.get(`${base}/audit`)).status).toBe(403)
  })
})

describe('reviews waiting for me, mentions of nobody, and networks that do not solve', () => {
  it('lists, across projects, the reviews waiting for the caller\'s own decision, until they decide', async () => {
    const waitingFor = async (who: Person) => {
      const answer = await who.client.get('/api/reviews/waiting')
      expect(answer.status).toBe(200)
      return answer.body as Array<{ reviewId: string; projectId: string; projectName: string; networkId: string; snapshotId: string; snapshotTitle: string; requestedBy: { name: string } }>
    }
    const snap = await snapshot('Rev W waiting')
    const review = (await editor.client.post(`${base}/snapshots/${snap.id}/reviews`, { reviewerIds: [r1.id, r2.id] })).body
    const r1Sees = (await waitingFor(r1)).find(w => w.reviewId === review.id)
    expect(r1Sees).toMatchObject({ projectId, projectName: 'Review bench', networkId, snapshotId: snap.id, snapshotTitle: 'Rev W waiting', requestedBy: { name: 'Eamon Editor' } })
    expect((await waitingFor(r2)).map(w => w.reviewId)).toContain(review.id)
    for (const other of [owner, editor, viewer]) expect((await waitingFor(other)).map(w => w.reviewId)).not.toContain(review.id)
    await r1.client.post(`${base}/reviews/${review.id}/decision`, { decision: 'clear' })
    expect((await waitingFor(r1)).map(w => w.reviewId)).not.toContain(review.id)
    expect((await waitingFor(r2)).map(w => w.reviewId)).toContain(review.id)
    // A reviewer who lost the role to decide no longer sees it waiting.
    await owner.client.patch(`${base}/members/${r2.id}`, { role: 'viewer' })
    expect((await waitingFor(r2)).map(w => w.reviewId)).not.toContain(review.id)
    await owner.client.patch(`${base}/members/${r2.id}`, { role: 'reviewer' })
    await editor.client.post(`${base}/reviews/${review.id}/withdraw`, {})
    expect((await waitingFor(r2)).map(w => w.reviewId)).not.toContain(review.id)
  })

  it('a comment answers which mentions matched nobody, and mails only the members it did match', async () => {
    const snap = await snapshot('Rev M mentions')
    const handle = editor.email.split('@')[0]
    let answer: Awaited<ReturnType<ApiClient['post']>> | undefined
    const mail = await mailDuring(everyone, async () => {
      answer = await r1.client.post(`${base}/snapshots/${snap.id}/comments`, { body: `@${handle} and @priya-not-here, look at T12.` })
    })
    expect(answer!.status, JSON.stringify(answer!.body)).toBe(201)
    expect(answer!.body.unmatchedMentions).toEqual([{ handle: '@priya-not-here', reason: 'nobody' }])
    expect(mail.map(m => m.to)).toEqual([[editor.email]])
    const edited = await r1.client.patch(`${base}/comments/${answer!.body.id}`, { body: 'Also @ghost@nowhere.example' })
    expect(edited.body.unmatchedMentions).toEqual([{ handle: '@ghost@nowhere.example', reason: 'nobody' }])
  })

  it('a network that does not solve: freezing or asking for review with allowUnsolved false answers 422 naming the problem; confirmed, it goes through', async () => {
    const broken = (await editor.client.post(`${base}/networks`, { name: 'Does not solve', document: { ...branchLineHybrid, blocks: [], wires: [] } })).body.id
    const refused = await editor.client.post(`${base}/networks/${broken}/snapshots`, { title: 'Broken', allowUnsolved: false })
    expect(refused.status).toBe(422)
    expect(refused.body.message).toMatch(/^This network does not solve: .+\. Freeze it anyway/)
    expect(refused.body.data.unsolved.problem).toEqual(expect.any(String))
    expect((await editor.client.get(`${base}/networks/${broken}/snapshots`)).body).toEqual([])
    const frozen = await editor.client.post(`${base}/networks/${broken}/snapshots`, { title: 'Broken' })
    expect(frozen.status).toBe(201)
    expect(frozen.body.summary).toMatchObject({ solved: false, problem: refused.body.data.unsolved.problem })
    const notSent = await editor.client.post(`${base}/snapshots/${frozen.body.id}/reviews`, { reviewerIds: [r1.id], allowUnsolved: false })
    expect(notSent.status).toBe(422)
    expect(notSent.body.message).toMatch(/^This snapshot does not solve: .+\. Send it for review anyway/)
    const sent = await editor.client.post(`${base}/snapshots/${frozen.body.id}/reviews`, { reviewerIds: [r1.id], allowUnsolved: true })
    expect(sent.status).toBe(201)
    const audit = (await owner.client.get(`${base}/audit`)).body as Array<{ action: string; detail: Record<string, unknown> }>
    expect(audit.find(e => e.action === 'snapshot.created' && e.detail.snapshotId === frozen.body.id)?.detail.unsolved).toBe(refused.body.data.unsolved.problem)
    expect(audit.find(e => e.action === 'review.requested' && e.detail.snapshotId === frozen.body.id)?.detail.unsolved).toBe(refused.body.data.unsolved.problem)
  })
})

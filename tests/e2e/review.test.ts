import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { launchBrowser, screenshot, signIn } from '../support/browser'
import { appUrl } from '../support/app'
import { outboxList, outboxMessage } from '../support/mail'

type Browser = Awaited<ReturnType<typeof launchBrowser>>
let editor: Browser
let reviewer: Browser
const PASSWORD = 'quillmere-demo-2026'
const NETWORK = 'Quadrature split, 2.45 GHz (branch-line from lines)'
const title = `Bench rev ${Date.now().toString(36)}`
let snapshotUrl = ''

beforeAll(async () => {
  editor = await launchBrowser()
  reviewer = await launchBrowser()
})
afterAll(async () => {
  await editor?.close()
  await reviewer?.close()
})

describe('design review in a real browser', () => {
  it('an editor freezes a snapshot and asks a reviewer, who gets the e-mail', async () => {
    const { page } = editor
    await signIn(page, 'tomas@quillmere.example', PASSWORD)
    await page.getByText('Beam-switch feed, S-band').click()
    await page.getByTestId(`snapshots-of-${NETWORK}`).click()
    await page.getByTestId('freeze-form').waitFor()
    await page.getByTestId('snapshot-title').fill(title)
    await page.getByTestId('snapshot-note').fill('Arms resized for 2.45 GHz; please check the match and the split.')
    await page.getByTestId('snapshot-freeze').click()
    await page.waitForURL(/\/snapshots\/[^/]+\/[0-9a-f-]{36}$/)
    snapshotUrl = page.url()
    await page.getByTestId('snapshot-heading').getByText(title).waitFor()
    // The frozen network is in the editor, read-only, solved, with its plots.
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("4-port")', { timeout: 30_000 })
    expect(await page.getByTestId('block-rail').count()).toBe(0)
    await page.getByTestId('reviewer-priya@quillmere.example').check()
    await page.getByTestId('review-message').fill('Is the split even enough at the band edges?')
    await page.getByTestId('review-send').click()
    await page.getByTestId('review-state-awaiting').waitFor()
    await screenshot(page, 'review-1-requested')

    const sent = (await outboxList()).filter(m => m.to.includes('priya@quillmere.example') && m.subject.includes(title))
    expect(sent).toHaveLength(1)
    const mail = await outboxMessage(sent[0]!.id)
    expect(mail.subject).toBe(`Your review, please: “${title}” (Beam-switch feed, S-band)`)
    expect(mail.text).toContain(snapshotUrl.replace(/^https?:\/\/[^/]+/, ''))
  })

  it('the reviewer follows the link, comments on a block and on a frequency band, and clears the design', async () => {
    const { page } = reviewer
    await signIn(page, 'priya@quillmere.example', PASSWORD)
    await page.goto(snapshotUrl)
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("4-port")', { timeout: 30_000 })
    await page.getByTestId('review-decide').waitFor()

    await page.getByTestId('comment-anchor').selectOption('block')
    const block = await page.getByTestId('comment-block').locator('option:not([disabled])').first().getAttribute('value')
    await page.getByTestId('comment-block').selectOption(block!)
    await page.getByTestId('comment-body').fill(`${block} looks narrow for 35 Ω; @tomas can you confirm the width?`)
    await page.getByTestId('comment-post').click()
    await page.getByTestId('thread-anchor-block').getByText(`Block ${block}`).waitFor()

    await page.getByTestId('comment-anchor').selectOption('band')
    await page.getByTestId('comment-band-low').fill('2.6 GHz')
    await page.getByTestId('comment-band-high').fill('2.8 GHz')
    await page.getByTestId('comment-body').fill('Isolation falls off up here; fine for the bench.')
    await page.getByTestId('comment-post').click()
    await page.getByTestId('thread-anchor-band').getByText('2.600 GHz – 2.800 GHz').waitFor()
    // The band is drawn on the response plot.
    await page.getByTestId('view-tab-response').click()
    await page.getByTestId('plot-band').first().waitFor()
    await screenshot(page, 'review-2-comments')

    await page.getByTestId('decision-note').fill('Match and split are within the bench spec.')
    await page.getByTestId('decide-clear').click()
    await page.getByTestId('review-state-cleared').waitFor()
    expect(await page.getByTestId('review-history').textContent()).toContain('Priya Castellane cleared the design')
    await screenshot(page, 'review-3-cleared')
  })

  it('the editor sees the decision, the comments and the e-mails that came of them', async () => {
    const { page } = editor
    await page.goto(snapshotUrl)
    await page.getByTestId('review-state-cleared').waitFor()
    expect(await page.getByTestId('review-reviewers').textContent()).toMatch(/Priya Castellane\s*cleared/)
    expect(await page.getByTestId('review-comments').textContent()).toContain('Isolation falls off up here')
    await screenshot(page, 'review-4-editor-sees-decision')

    const toTomas = (await outboxList()).filter(m => m.to.includes('tomas@quillmere.example') && m.subject.includes(title))
    expect(toTomas.map(m => m.subject).sort()).toEqual([
      `Priya Castellane cleared the design: “${title}”`,
      `Priya Castellane mentioned you on “${title}”`,
    ])

    await page.goto(appUrl('/'))
    await page.getByText('Beam-switch feed, S-band').click()
    await page.getByTestId('project-reviews').getByText(title).waitFor()
    expect(await page.getByTestId('project-reviews').textContent()).toContain('Cleared to proceed')
  })
})

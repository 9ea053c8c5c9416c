/**
 * The tune and tolerance panel in a real browser: a slider per tunable that edits the document, and a
 * yield run spread over Web Workers whose count equals the library's for the same seed.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { branchLineTuning } from '../../shared/examples/index'
import { prepareTuning, rankTolerances, resolveTolerances, runTrials } from '../../shared/tuning/index'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'
import { newSignedInUser, TEST_PASSWORD } from '../support/http'

let page: Page
let close: () => Promise<void>
let networkPath = ''
let detunedPath = ''

describe('tune and tolerance panel', () => {
  beforeAll(async () => {
    const { client, email } = await newSignedInUser('Tuning Tester')
    const project = await client.post('/api/projects', { name: `Tuning ${Date.now()}` })
    expect(project.status).toBe(201)
    const network = await client.post(`/api/projects/${project.body.id}/networks`, { name: 'Branch-line with tolerances', document: branchLineTuning(false) })
    expect(network.status).toBe(201)
    networkPath = `/projects/${project.body.id}/networks/${network.body.id}`
    const detuned = await client.post(`/api/projects/${project.body.id}/networks`, { name: 'Branch-line, arms detuned', document: branchLineTuning(true) })
    expect(detuned.status).toBe(201)
    detunedPath = `/projects/${project.body.id}/networks/${detuned.body.id}`
    const browser = await signedInBrowser(email, TEST_PASSWORD, { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('runs a yield analysis in workers with the library\'s answer, and a slider edits its tunable', async () => {
    await page.goto(appUrl(networkPath))
    await page.click('[data-testid="open-tuning"]')
    await page.waitForSelector('[data-testid="tune-T12.impedance"] input[type="range"]')
    expect(await page.textContent('[data-testid="tune-T12.impedance"]')).toContain('35.36 Ω')

    await page.fill('[data-testid="yield-trials"]', '60')
    await page.fill('[data-testid="yield-seed"]', '3')
    await page.click('[data-testid="yield-run"]')
    await page.waitForSelector('[data-testid="yield-result"]', { timeout: 120_000 })
    const prepared = prepareTuning(branchLineTuning(false))
    if (!prepared.ok) throw new Error('example did not prepare')
    const spreads = resolveTolerances(prepared.setup)
    if (!spreads.ok) throw new Error('tolerances did not resolve')
    const passed = runTrials(prepared.setup, spreads.spreads, { seed: 3, to: 60 }).passed
    expect(await page.textContent('[data-testid="yield-result"]')).toContain(`(${passed} of 60, seed 3)`)
    await screenshot(page, 'tuning-panel')

    // Each tolerance alone over the same 60 trials, as rankTolerances does it.
    await page.click('[data-testid="rank-run"]')
    await page.waitForSelector('[data-testid="rank-result"]', { timeout: 120_000 })
    const ranking = rankTolerances(prepared.setup, spreads.spreads, { seed: 3, trials: 60 })
    const rows = await page.$$eval('[data-testid="rank-result"] tbody tr', trs => trs.map(tr => [...tr.querySelectorAll('td')].map(td => td.textContent?.trim() ?? '')))
    // Ties may list in another order (the live document keeps its own key order), so compare key by key.
    expect(Object.fromEntries(rows)).toEqual(Object.fromEntries(ranking.map(c => [c.key, `${(100 * c.yield).toFixed(1)} %`])))
    const shown = rows.map(([, y]) => Number.parseFloat(y!))
    expect(shown).toEqual([...shown].sort((a, b) => a - b))

    // The slider runs over 25…50 Ω in 1000 steps: step 400 is 35 Ω.
    await page.fill('[data-testid="tune-T12.impedance"] input[type="range"]', '400')
    await page.waitForFunction(() => document.querySelector('[data-testid="tune-T12.impedance"]')?.textContent?.includes('35 Ω'))
  })

  it('optimises a detuned branch-line in a worker, writes the values as one undo step, and undo restores them', async () => {
    await page.goto(appUrl(detunedPath))
    await page.click('[data-testid="open-tuning"]')
    await page.waitForSelector('[data-testid="tune-T12.impedance"] input[type="range"]')
    // Arms 20 % off: 1.2 · 50/√2 = 42.43 Ω.
    expect(await page.textContent('[data-testid="tune-T12.impedance"]')).toContain('42.43 Ω')
    await page.click('[data-testid="optimize-run"]')
    await page.waitForSelector('[data-testid="optimize-result"]', { timeout: 120_000 })
    expect(await page.textContent('[data-testid="optimize-result"]')).toMatch(/^\s*The spec is met after \d+ evaluations/)
    await page.waitForFunction(() => !document.querySelector('[data-testid="tune-T12.impedance"]')?.textContent?.includes('42.43 Ω'))
    await page.click('[data-testid="undo"]')
    await page.waitForFunction(() => document.querySelector('[data-testid="tune-T12.impedance"]')?.textContent?.includes('42.43 Ω'))
    await page.waitForFunction(() => document.querySelector('[data-testid="tune-BR14.impedance"]')?.textContent?.includes('40 Ω'))
  })
})

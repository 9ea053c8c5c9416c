/**
 * Long runs from the Tune and tolerance panel: "Send to the server" with a queue worker running shows progress
 * and the yield `runTrials` gives for the same seed; a yield run that keeps a trace shows its spread.
 */
import { spawn, type ChildProcess } from 'node:child_process'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { branchLineTuning } from '../../shared/examples/index'
import { prepareTuning, resolveTolerances, runTrials } from '../../shared/tuning/index'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'
import { newSignedInUser, TEST_PASSWORD } from '../support/http'

let page: Page
let close: () => Promise<void>
let networkPath = ''
let worker: ChildProcess | undefined

describe('server runs and spreads in the tune panel', () => {
  beforeAll(async () => {
    const { client, email } = await newSignedInUser('Queue Panel Tester')
    const project = await client.post('/api/projects', { name: `Queue panel ${Date.now()}` })
    const network = await client.post(`/api/projects/${project.body.id}/networks`, { name: 'Branch-line with tolerances', document: branchLineTuning(false) })
    expect(network.status).toBe(201)
    networkPath = `/projects/${project.body.id}/networks/${network.body.id}`
    worker = spawn(process.execPath, ['--import', 'tsx', 'scripts/worker.ts'], { cwd: process.cwd(), stdio: 'ignore', env: { ...process.env, NUXT_DATABASE_URL: process.env.PORTWRIGHT_TEST_DATABASE_URL! } })
    const browser = await signedInBrowser(email, TEST_PASSWORD, { width: 1500, height: 1000 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => {
    worker?.kill('SIGTERM')
    await close?.()
  })

  it('sends a yield run to the server and shows its answer, the same as the library\'s', async () => {
    await page.goto(appUrl(networkPath))
    await page.click('[data-testid="open-tuning"]')
    await page.waitForSelector('[data-testid="tuning-server"]')
    await page.fill('[data-testid="server-trials"]', '1500')
    await page.fill('[data-testid="server-seed"]', '4')
    await page.click('[data-testid="server-send"]')
    await page.waitForSelector('[data-server-run] [data-testid="server-run-result"]', { timeout: 150_000 })
    const prepared = prepareTuning(branchLineTuning(false))
    if (!prepared.ok) throw new Error('example did not prepare')
    const spreads = resolveTolerances(prepared.setup)
    if (!spreads.ok) throw new Error('tolerances did not resolve')
    const passed = runTrials(prepared.setup, spreads.spreads, { seed: 4, to: 1500 }).passed
    expect(await page.textContent('[data-server-run] [data-testid="server-run-result"]')).toContain(`(${passed.toLocaleString('en')} of 1,500)`)
    expect(await page.textContent('[data-server-run] [data-testid="server-run-state"]')).toBe('done')
    await screenshot(page, 'tuning-server-run')
  }, 180_000)

  it('keeps the spread of a trace over a yield run: envelope and a histogram of every solved trial', async () => {
    await page.fill('[data-testid="yield-trials"]', '40')
    await page.fill('[data-testid="yield-seed"]', '2')
    await page.fill('[data-testid="yield-trace"]', 'S21')
    await page.click('[data-testid="yield-run"]')
    await page.waitForSelector('[data-testid="yield-spread"]', { timeout: 120_000 })
    const counts = await page.$$eval('[data-testid="yield-histogram"] rect', rs => rs.map(r => Number(r.getAttribute('data-count'))))
    expect(counts).toHaveLength(20)
    expect(counts.reduce((a, b) => a + b, 0)).toBe(40)
    expect(await page.$('[data-testid="yield-envelope"] canvas')).not.toBeNull()
    await page.locator('[data-testid="yield-spread"]').scrollIntoViewIfNeeded()
    await screenshot(page, 'tuning-spread')
  }, 150_000)
})

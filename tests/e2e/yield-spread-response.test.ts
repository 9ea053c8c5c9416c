/**
 * A yield run that keeps traces shades their spread on the Response view (min–max and 5–95 % per trace, behind
 * the trace), and the switch there hides it again.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { branchLineTuning } from '../../shared/examples/index'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'
import { newSignedInUser, TEST_PASSWORD } from '../support/http'

let page: Page
let close: () => Promise<void>
let networkPath = ''

const plotPixels = () => page.$eval('[data-testid="response-plot"] canvas', c => (c as HTMLCanvasElement).toDataURL())

describe('yield spread on the Response view', () => {
  beforeAll(async () => {
    const { client, email } = await newSignedInUser('Spread Tester')
    const project = await client.post('/api/projects', { name: `Spread ${Date.now()}` })
    const network = await client.post(`/api/projects/${project.body.id}/networks`, { name: 'Branch-line with tolerances', document: branchLineTuning(false) })
    expect(network.status).toBe(201)
    networkPath = `/projects/${project.body.id}/networks/${network.body.id}`
    const browser = await signedInBrowser(email, TEST_PASSWORD, { width: 1500, height: 1000 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('shades S21 and S31 after a yield run that kept them, and hides the shading on request', async () => {
    await page.goto(appUrl(networkPath))
    await page.click('[data-testid="view-tab-response"]')
    await page.waitForSelector('[data-testid="response-plot"] canvas')
    expect(await page.getAttribute('[data-testid="response-plot"]', 'data-fills')).toBeNull()
    expect(await page.$('[data-testid="response-spread-toggle"]')).toBeNull()

    await page.click('[data-testid="open-tuning"]')
    await page.fill('[data-testid="yield-trials"]', '60')
    await page.fill('[data-testid="yield-seed"]', '2')
    await page.fill('[data-testid="yield-trace"]', 'S21, S31')
    await page.click('[data-testid="yield-run"]')
    await page.waitForSelector('[data-testid="yield-spread-on-response"]', { timeout: 120_000 })
    expect(await page.$$('[data-testid="yield-spread"]')).toHaveLength(2)

    await page.waitForSelector('[data-testid="response-plot"][data-fills]')
    expect(await page.getAttribute('[data-testid="response-plot"]', 'data-fills')).toBe('S21 min–max, S21 5–95 %, S31 min–max, S31 5–95 %')
    expect(await page.textContent('[data-testid="view-response"]')).toContain('Yield spread (S21, S31)')
    await page.waitForTimeout(300)
    const shaded = await plotPixels()
    await screenshot(page, 'response-yield-spread')

    await page.uncheck('[data-testid="response-spread-toggle"]')
    await page.waitForFunction(() => !document.querySelector('[data-testid="response-plot"]')?.hasAttribute('data-fills'))
    await page.waitForTimeout(300)
    // The shading is what the switch takes away, and puts back.
    expect(await plotPixels()).not.toBe(shaded)
    await page.check('[data-testid="response-spread-toggle"]')
    await page.waitForSelector('[data-testid="response-plot"][data-fills]')
    await page.waitForTimeout(300)
    expect(await plotPixels()).toBe(shaded)
  }, 180_000)
})

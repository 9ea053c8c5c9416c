/**
 * The balanced-amplifier template from the gallery of a project without the amplifier's data file: creating it
 * uploads the file into the project, and the editor solves the pair at once — matched at the input where one
 * stage is not, with one stage's gain.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'

let page: Page
let close: () => Promise<void>

function readNumber(text: string | null): number {
  return Number.parseFloat((text ?? '').trim().replace('\u2212', '-'))
}

describe('balanced-amplifier template', () => {
  beforeAll(async () => {
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026', { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('brings lna-invented.s2p into the project and solves: input matched, gain of one stage', async () => {
    await page.goto(appUrl('/'))
    await page.click('text=Beam-switch feed, S-band')
    await page.waitForURL(/\/projects\/[0-9a-f-]{36}/)
    const projectId = /\/projects\/([0-9a-f-]{36})/.exec(page.url())![1]!
    const filesBefore = await (await page.request.get(appUrl(`/api/projects/${projectId}/files`))).json() as Array<{ name: string }>
    expect(filesBefore.map(f => f.name)).not.toContain('lna-invented.s2p')

    await page.click('[data-testid="template-gallery-toggle"]')
    const card = page.locator('[data-testid="template-card-balanced-amplifier"]')
    await card.waitFor()
    expect(await card.locator('[data-testid="template-files-balanced-amplifier"]').textContent()).toContain('lna-invented.s2p')
    await page.click('[data-testid="template-create-balanced-amplifier"]')
    await page.waitForURL(/\/networks\//)
    await page.waitForSelector('[data-testid="block-AmpA"]')
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("2-port")', { timeout: 60_000 })
    if (!(await page.$('[data-testid="readout-m1"]'))) await page.keyboard.press('m')
    await page.fill('[data-testid="readout-m1-frequency"]', '2.45 GHz')
    await page.press('[data-testid="readout-m1-frequency"]', 'Enter')
    // Two equal stages between equal-split quadrature hybrids: input reflection ½(Γa − Γb) = 0 and |S21| of one
    // stage (Kurokawa, Bell System Technical Journal 44(8), 1965 [memory]); the invented stage has 15 dB at 2.45 GHz.
    await expect.poll(async () => readNumber(await page.textContent('[data-testid="readout-m1-S21-db"]'))).toBeCloseTo(15, 1)
    expect(readNumber(await page.textContent('[data-testid="readout-m1-S11-db"]'))).toBeLessThan(-40)
    await screenshot(page, 'template-balanced-amplifier')

    const filesAfter = await (await page.request.get(appUrl(`/api/projects/${projectId}/files`))).json() as Array<{ name: string }>
    expect(filesAfter.filter(f => f.name === 'lna-invented.s2p')).toHaveLength(1)
  }, 120_000)
})

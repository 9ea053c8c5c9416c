/**
 * The template gallery in a real browser: an editor opens "New from template" on the project page,
 * reads a card's spec, creates a network from the two-section quadrature card, and the editor
 * solves it at once. A viewer sees no gallery. Screenshots go to test-results/template-gallery/.
 */
import { mkdirSync } from 'node:fs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { appUrl } from '../support/app'
import { launchBrowser, signIn, signedInBrowser } from '../support/browser'

const shots = 'test-results/template-gallery'
let page: Page
let close: () => Promise<void>

function readNumber(text: string | null): number {
  return Number.parseFloat((text ?? '').trim().replace('\u2212', '-'))
}

describe('template gallery', () => {
  beforeAll(async () => {
    mkdirSync(shots, { recursive: true })
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026', { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('creates a network from the two-section quadrature card and the editor solves it: −3 dB to each output', async () => {
    await page.goto(appUrl('/'))
    await page.click('text=Beam-switch feed, S-band')
    await page.click('[data-testid="template-gallery-toggle"]')
    const card = page.locator('[data-testid="template-card-two-section-quadrature"]')
    await card.waitFor()
    await expect.poll(() => page.locator('[data-testid^="template-card-"]').count()).toBe(6)
    await card.locator('summary').click()
    const spec = await card.locator('[data-testid="template-spec-two-section-quadrature"]').textContent()
    expect(spec).toContain('return loss at port 1 ≥ 20 dB')
    expect(spec).toMatch(/from 2\.18\d* GHz to 2\.72\d* GHz/)
    await card.locator('svg path').first().waitFor()
    await page.locator('[data-testid="template-gallery"]').screenshot({ path: `${shots}/gallery.png` })

    await page.click('[data-testid="template-create-two-section-quadrature"]')
    await page.waitForURL(/\/networks\//)
    await page.waitForSelector('[data-testid="block-Br3"]')
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("4-port")')
    if (!(await page.$('[data-testid="readout-m1"]'))) await page.keyboard.press('m')
    await page.fill('[data-testid="readout-m1-frequency"]', '2.45 GHz')
    await page.press('[data-testid="readout-m1-frequency"]', 'Enter')
    // Pozar, Microwave Engineering, 4th ed., §7.5: an equal split is −3.01 dB to each output.
    await expect.poll(async () => readNumber(await page.textContent('[data-testid="readout-m1-S21-db"]'))).toBeCloseTo(-3.01, 1)
    expect(readNumber(await page.textContent('[data-testid="readout-m1-S31-db"]'))).toBeCloseTo(-3.01, 1)
    await page.screenshot({ path: `${shots}/editor.png` })
  })

  it('shows a viewer no gallery', async () => {
    const viewer = await launchBrowser()
    try {
      await signIn(viewer.page, 'jun@quillmere.example', 'quillmere-demo-2026')
      await viewer.page.goto(appUrl('/'))
      await viewer.page.click('text=Beam-switch feed, S-band')
      await viewer.page.waitForSelector('text=Networks')
      expect(await viewer.page.$('[data-testid="template-gallery-toggle"]')).toBeNull()
    } finally {
      await viewer.close()
    }
  })
})

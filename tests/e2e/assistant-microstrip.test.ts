/**
 * The quadrature assistant in microstrip in a real browser: on a new network of the demo project, ask
 * for an equal-split quadrature hybrid on a board of the project's substrate library, place it (tee
 * junctions and compensated arms by default), and read in the Spec view that the placed network meets
 * its spec over its band. Screenshots go to test-results/screenshots/assistant-microstrip-*.png.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { screenshot, signedInBrowser, createNetworkInProject } from '../support/browser'

let page: Page
let close: () => Promise<void>
const board = 'Quillmere QL-350 0.508 mm'

describe('quadrature assistant in microstrip', () => {
  beforeAll(async () => {
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026', { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('places the hybrid on a library board with tee junctions, and the Spec view says it meets its spec', async () => {
    await createNetworkInProject(page, 'Beam-switch feed, S-band', `Microstrip hybrid ${Date.now()}`)
    await page.click('[data-testid="open-assistant"]')
    await page.selectOption('[data-testid="assistant-kind"]', 'quadrature')
    await page.fill('[data-testid="assistant-frequency"]', '2.45 GHz')
    await page.fill('[data-testid="assistant-impedance"]', '50 ohm')
    // The library is fetched when the Medium group opens.
    await page.waitForSelector(`[data-testid="assistant-medium-choice"] option:has-text("${board}")`, { state: 'attached' })
    await page.selectOption('[data-testid="assistant-medium-choice"]', { label: board })
    await expect.poll(() => page.inputValue('[data-testid="assistant-substrate-permittivity"]')).toBe('3.5')
    // Junctions left at their default: tee models with compensated arms.
    expect(await page.inputValue('[data-testid="assistant-substrate-junctions"]')).toBe('')
    await expect.poll(() => page.textContent('[data-testid="assistant-band"]'), { timeout: 20_000 }).toMatch(/\(\d+(\.\d+)? %/)
    const asked = Number(/\((\d+(?:\.\d+)?) %/.exec((await page.textContent('[data-testid="assistant-band"]'))!)![1])
    // One section on this board: about the 10 % of the ideal design (README "Design assistants in microstrip").
    expect(asked).toBeGreaterThanOrEqual(8)
    await page.locator('[data-testid="assistant-panel"]').screenshot({ path: 'test-results/screenshots/assistant-microstrip-panel.png' })
    await page.click('[data-testid="assistant-place"]')
    // Four tees at the junctions, one step from each port's strip into the through arm.
    await page.waitForSelector('[data-testid="block-Tj4"]')
    await page.waitForSelector('[data-testid="block-Js4"]')
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("4-port")', { timeout: 30_000 })
    await page.click('[data-testid="view-tab-spec"]')
    // The Spec view is loaded when first opened.
    await page.waitForSelector('[data-testid="spec-verdict"]', { timeout: 30_000 })
    await expect.poll(() => page.textContent('[data-testid="spec-verdict"]'), { timeout: 30_000 }).toMatch(/^Meets the spec over the band \(\d+ points\)\.$/)
    // The band over which every condition holds contains the spec band the assistant wrote.
    await page.waitForSelector('[data-testid="spec-fractional"]')
    expect(Number.parseFloat((await page.textContent('[data-testid="spec-fractional"]'))!)).toBeGreaterThanOrEqual(asked)
    await screenshot(page, 'assistant-microstrip-spec')
  })
})

/**
 * Microstrip in the editor, in a real browser: a line placed from the rail gets a substrate and
 * solves; the substrate is edited in the settings panel; the line calculator sizes the line
 * (Pozar, Microwave Engineering, 4th ed., Example 3.7 [memory]: εr = 2.20, h = 0.127 cm, 50 Ω,
 * 90° at 2.5 GHz → W ≈ 0.391 cm, l ≈ 2.19 cm) and writes width and length into the block.
 */
import { mkdirSync } from 'node:fs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { signedInBrowser, createNetworkInProject } from '../support/browser'

const shots = 'test-results/microstrip'
let page: Page
let close: () => Promise<void>

async function select(id: string) {
  await page.click(`[data-testid="block-${id}"]`)
  await page.waitForSelector(`[data-testid="connect-${id}.1"]`)
}

describe('microstrip in the editor', () => {
  beforeAll(async () => {
    mkdirSync(shots, { recursive: true })
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026', { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('places a microstrip, edits its substrate and sizes it with the line calculator', async () => {
    await createNetworkInProject(page, 'Beam-switch feed, S-band', `Microstrip check ${Date.now()}`)
    await page.waitForSelector('[data-testid="rail-microstrip"]')

    for (const kind of ['port', 'port', 'microstrip']) await page.click(`[data-testid="rail-${kind}"]`)
    await select('MT1')
    await page.selectOption('[data-testid="connect-MT1.1"]', 'P1.1')
    await page.selectOption('[data-testid="connect-MT1.2"]', 'P2.1')
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("2-port")')
    expect(await page.$('[data-testid="solve-problems"]')).toBeNull()
    expect(await page.inputValue('[data-testid="param-substrate"]')).toBe('board')

    await page.click('[data-testid="open-settings"]')
    await page.fill('[data-testid="substrate-board-permittivity"]', '2.2')
    await page.fill('[data-testid="substrate-board-height"]', '0.127 cm')
    // Pozar's example has a strip of no thickness: clearing the field removes the key.
    await page.fill('[data-testid="substrate-board-thickness"]', '')
    await expect.poll(() => page.textContent('[data-testid="substrate-board-height-note"]')).toContain('1.27 mm')
    await page.click('[data-testid="line-calculator"] summary')
    await page.fill('[data-testid="calc-impedance"]', '50')
    await page.fill('[data-testid="calc-frequency"]', '2.5 GHz')
    await page.fill('[data-testid="calc-degrees"]', '90')
    await page.waitForSelector('[data-testid="calc-result"]')
    await page.locator('[data-testid="line-calculator"]').screenshot({ path: `${shots}/calculator.png` })
    await page.click('[data-testid="calc-apply"]')
    await page.click('[data-testid="settings-close"]')

    const width = Number.parseFloat(await page.inputValue('[data-testid="param-width"]'))
    const length = Number.parseFloat(await page.inputValue('[data-testid="param-length"]'))
    expect(Math.abs(width / 3.91 - 1)).toBeLessThan(0.005)
    expect(Math.abs(length / 21.9 - 1)).toBeLessThan(0.01)
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("2-port")')
    expect(await page.$('[data-testid="solve-problems"]')).toBeNull()
    await page.screenshot({ path: `${shots}/canvas.png`, clip: (await page.locator('[data-testid="canvas"]').boundingBox())! })
  })
})

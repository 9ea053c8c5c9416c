/**
 * The project's substrate library in a real browser: the demo boards on the project page, a board
 * added there, and copied into a network from the editor's settings panel, where it solves.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser, createNetworkHere } from '../support/browser'

let page: Page
let close: () => Promise<void>

describe('substrate library', () => {
  beforeAll(async () => {
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026', { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('lists the demo boards, adds one, and copies it into a network', async () => {
    await page.goto(appUrl('/'))
    await page.click('text=Beam-switch feed, S-band')
    await page.waitForSelector('[data-testid="project-substrates"]')
    expect(await page.textContent('[data-testid="substrate-library-list"]')).toContain('Quillmere QL-350 0.508 mm')
    const name = `Check board ${Date.now()}`
    await page.click('[data-testid="substrate-library-add"]')
    await page.fill('[data-testid="library-name"]', name)
    await page.fill('[data-testid="library-permittivity"]', '2.2')
    await page.fill('[data-testid="library-height"]', '1.27')
    await page.click('[data-testid="library-save"]')
    await expect.poll(() => page.textContent('[data-testid="substrate-library-list"]')).toContain(name)
    await screenshot(page, 'substrate-library-project')

    await createNetworkHere(page, `Library copy ${Date.now()}`)
    await page.click('[data-testid="open-settings"]')
    await page.click('[data-testid="substrate-library-picker"] summary')
    await page.waitForSelector('[data-testid="library-choice"]')
    await page.selectOption('[data-testid="library-choice"]', { label: `${name} (εr 2.2, 1.27 mm)` })
    await page.click('[data-testid="library-copy"]')
    await expect.poll(() => page.textContent('[data-testid="library-copy-message"]')).toContain('Copied')
    const key = name.replace(/ /g, '_')
    await page.waitForSelector(`[data-testid="substrate-${key}"]`)
    expect(await page.inputValue(`[data-testid="substrate-${key}-height"]`)).toBe('1.27 mm')
    await screenshot(page, 'substrate-library-editor')
  })
})

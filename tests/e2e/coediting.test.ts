/**
 * Live co-editing in two real browsers: the owner and an editor of the demo
 * project open one new network; each sees the other's edits as they happen,
 * the other's initials in the bar, and the other's selection outlined on the
 * canvas. Screenshots of both windows go to test-results/coediting/.
 */
import { mkdirSync } from 'node:fs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { launchBrowser, signIn, createNetworkInProject } from '../support/browser'

const shots = 'test-results/coediting'
let ines: Page
let tomas: Page
const closers: Array<() => Promise<void>> = []

async function open(email: string): Promise<Page> {
  const browser = await launchBrowser()
  closers.push(browser.close)
  await signIn(browser.page, email, 'quillmere-demo-2026')
  return browser.page
}

describe('live co-editing in the browser', () => {
  beforeAll(async () => {
    mkdirSync(shots, { recursive: true })
    ines = await open('ines@quillmere.example')
    tomas = await open('tomas@quillmere.example')
  })
  afterAll(async () => { for (const close of closers) await close() })

  it('two people see each other\'s changes and presence', async () => {
    await createNetworkInProject(ines, 'Beam-switch feed, S-band', `Co-editing check ${Date.now()}`)
    await ines.waitForSelector('[data-testid="live-status"][data-status="live"]')

    await tomas.goto(ines.url())
    await tomas.waitForSelector('[data-testid="live-status"][data-status="live"]')

    // Each sees the other in the bar, by initials.
    await ines.waitForSelector('[data-testid="live-peer"][data-initials="TR"]')
    await tomas.waitForSelector('[data-testid="live-peer"][data-initials="IO"]')

    // Ines places a port; it appears at Tomas's without a reload.
    await ines.click('[data-testid="rail-port"]')
    await tomas.waitForSelector('[data-testid="block-P1"]', { timeout: 10_000 })

    // Tomas places a line and sets its impedance; Ines sees both.
    await tomas.click('[data-testid="rail-line"]')
    await ines.waitForSelector('[data-testid="block-LN1"]', { timeout: 10_000 })
    await tomas.click('[data-testid="block-LN1"]')
    await tomas.fill('[data-testid="param-impedance"]', '35.36')

    // Tomas's selection is outlined on Ines's canvas in his colour.
    await ines.waitForSelector('[data-testid="remote-selection-LN1"]', { timeout: 10_000 })
    const colour = await ines.getAttribute('[data-testid="remote-selection-LN1"]', 'stroke')
    const chip = await ines.getAttribute('[data-testid="live-peer"][data-initials="TR"]', 'style')
    expect(chip).toContain(colour!)
    await ines.screenshot({ path: `${shots}/owner-sees-selection.png` })

    // His parameter value arrives in Ines's inspector.
    // The line was placed in the middle of Tomas's view, which may be outside Ines's: fit the network in view first.
    await ines.keyboard.press('0')
    await ines.waitForTimeout(400)
    await ines.click('[data-testid="block-LN1"]')
    await expect.poll(() => ines.inputValue('[data-testid="param-impedance"]'), { timeout: 10_000 }).toBe('35.36')

    // Undo at Ines's takes back her port only, not Tomas's line.
    await ines.click('[data-testid="undo"]')
    await tomas.waitForSelector('[data-testid="block-P1"]', { state: 'detached', timeout: 10_000 })
    expect(await tomas.$('[data-testid="block-LN1"]')).not.toBeNull()

    await ines.screenshot({ path: `${shots}/owner.png` })
    await tomas.screenshot({ path: `${shots}/editor.png` })
  })
})

/**
 * The network editor in a real browser: build a branch-line quadrature hybrid
 * from four lines and four ports through the block rail and the inspector,
 * read it at its centre frequency in the marker readout, reload, and find it
 * saved. Screenshots of the canvas and the plots go to test-results/.
 */
import { mkdirSync } from 'node:fs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { signedInBrowser, createNetworkInProject } from '../support/browser'

const shots = 'test-results/editor'
let page: Page
let close: () => Promise<void>

/** "−3.01 dB" or "−90.0°" → number (the readout uses a true minus sign). */
function readNumber(text: string | null): number {
  return Number.parseFloat((text ?? '').trim().replace('\u2212', '-'))
}

async function select(id: string) {
  await page.click(`[data-testid="block-${id}"]`)
  await page.waitForSelector(`[data-testid="connect-${id}.1"]`)
}

async function setParams(id: string, params: Record<string, string>) {
  await select(id)
  for (const [param, value] of Object.entries(params)) await page.fill(`[data-testid="param-${param}"]`, value)
}

async function wire(id: string, n: number, to: string) {
  await select(id)
  await page.selectOption(`[data-testid="connect-${id}.${n}"]`, to)
}

async function readout(trace: string) {
  return {
    db: readNumber(await page.textContent(`[data-testid="readout-m1-${trace}-db"]`)),
    deg: readNumber(await page.textContent(`[data-testid="readout-m1-${trace}-deg"]`)),
  }
}

async function placeMarkerAt(frequency: string) {
  await page.keyboard.press('Escape')
  if (!(await page.$('[data-testid="readout-m1"]'))) await page.keyboard.press('m')
  await page.fill('[data-testid="readout-m1-frequency"]', frequency)
  await page.press('[data-testid="readout-m1-frequency"]', 'Enter')
  await page.waitForFunction(() => document.querySelector<HTMLInputElement>('[data-testid="readout-m1-frequency"]')?.value === '2.450 GHz')
}

function expectQuadratureSplit(s21: { db: number, deg: number }, s31: { db: number, deg: number }) {
  expect(Math.abs(s21.db + 3.01)).toBeLessThanOrEqual(0.05)
  expect(Math.abs(s31.db + 3.01)).toBeLessThanOrEqual(0.05)
  // Phase difference on the circle: S21 leads S31 by 90° (Pozar §7.5: −90° and −180°).
  const diff = ((((s21.deg - s31.deg) % 360) + 540) % 360) - 180
  expect(Math.abs(Math.abs(diff) - 90)).toBeLessThanOrEqual(0.5)
}

describe('network editor', () => {
  beforeAll(async () => {
    mkdirSync(shots, { recursive: true })
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026', { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('builds a branch-line hybrid from the rail and inspector, reads it, and keeps it after a reload', async () => {
    await createNetworkInProject(page, 'Beam-switch feed, S-band', `Branch-line check ${Date.now()}`)
    await page.waitForSelector('[data-testid="rail-port"]')

    // The centre frequency: a variable f0 on a sweep that has it as a point.
    await page.click('[data-testid="open-settings"]')
    if (!(await page.$('[data-testid="variable-f0"]'))) {
      await page.click('[data-testid="variable-add"]')
      await page.fill('[data-testid="variables"] tr:last-child input >> nth=0', 'f0')
      await page.press('[data-testid="variables"] tr:last-child input >> nth=0', 'Enter')
    }
    await page.fill('[data-testid="variable-f0-expression"]', '2.45 GHz')
    await page.fill('[data-testid="sweep-start"]', '1.45 GHz')
    await page.fill('[data-testid="sweep-stop"]', '3.45 GHz')
    await page.fill('[data-testid="sweep-points"]', '201')
    await page.click('[data-testid="settings-close"]')

    for (const kind of ['port', 'port', 'port', 'port', 'line', 'line', 'line', 'line']) await page.click(`[data-testid="rail-${kind}"]`)
    // Through arms (1–2, 4–3) of Z0/√2, branch arms (1–4, 2–3) of Z0, all a quarter wave at f0.
    await setParams('LN1', { impedance: '50 ohm / sqrt(2)', degrees: '90', at: 'f0' })
    await setParams('LN2', { impedance: '50 ohm / sqrt(2)', degrees: '90', at: 'f0' })
    await setParams('LN3', { impedance: '50', degrees: '90', at: 'f0' })
    await setParams('LN4', { impedance: '50', degrees: '90', at: 'f0' })
    await expect.poll(() => page.textContent('[data-testid="param-impedance-note"]')).toContain('50 Ω')
    const wires: Array<[string, number, string]> = [
      ['LN1', 1, 'P1.1'], ['LN1', 2, 'P2.1'], ['LN2', 1, 'P4.1'], ['LN2', 2, 'P3.1'],
      ['LN3', 1, 'P1.1'], ['LN3', 2, 'P4.1'], ['LN4', 1, 'P2.1'], ['LN4', 2, 'P3.1'],
    ]
    for (const [id, n, to] of wires) await wire(id, n, to)
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("4-port")')

    await placeMarkerAt('2.45 GHz')
    expectQuadratureSplit(await readout('S21'), await readout('S31'))

    // Leave the marker field (Esc) before using a canvas key: a key typed into a field belongs to the field.
    await page.keyboard.press('Escape')
    await page.keyboard.press('0')
    expect(await page.inputValue('[data-testid="readout-m1-frequency"]')).toBe('2.450 GHz')
    // Live co-editing stores every change on the server as it is made; a live connection means saved.
    await expect.poll(() => page.getAttribute('[data-testid="live-status"]', 'data-status'), { timeout: 10_000 }).toBe('live')
    await page.screenshot({ path: `${shots}/canvas.png`, clip: (await page.locator('[data-testid="canvas"]').boundingBox())! })
    await page.locator('[data-testid="results-dock"]').screenshot({ path: `${shots}/response.png` })
    await page.click('[data-testid="view-tab-balance"]')
    await page.locator('[data-testid="results-dock"]').screenshot({ path: `${shots}/balance.png` })
    await page.click('[data-testid="view-tab-smith"]')
    await page.locator('[data-testid="results-dock"]').screenshot({ path: `${shots}/smith.png` })

    await page.reload()
    await page.waitForSelector('[data-testid="block-LN4"]')
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("4-port")')
    await page.click('[data-testid="view-tab-response"]')
    await placeMarkerAt('2.45 GHz')
    expectQuadratureSplit(await readout('S21'), await readout('S31'))
    await page.click('[data-testid="view-tab-table"]')
    await page.click('[data-testid="table-document"]')
    expect(await page.locator('[data-testid="wires-table"] tbody tr').count()).toBe(8)
    expect(await page.locator('[data-testid="blocks-table"] tbody tr').count()).toBe(8)
  })
})

/**
 * Measured part in, results out, in a real browser: a Touchstone file uploaded on the project page,
 * placed as a data block in a network, wired to two ports and solved in the page; its traces shown;
 * Touchstone exported from the results dock and read back with our reader, equal to the library's
 * solve of the same document with the same file.
 */
import { readFileSync } from 'node:fs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { inventedAmplifier } from '../../server/database/seeders/demo-touchstone'
import { solveDocument } from '../../shared/solver'
import { readTouchstone } from '../../shared/touchstone/read'
import { writeTouchstone } from '../../shared/touchstone/write'
import { SAFETY_NOTE } from '../../shared/solver/safety-note'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'
import { newSignedInUser, TEST_PASSWORD } from '../support/http'

let page: Page
let close: () => Promise<void>
let projectId = ''
let networkId = ''
// The demo's invented amplifier (2.0–2.9 GHz), written the way a bench would hand it over.
const ampText = writeTouchstone(inventedAmplifier(), { format: 'MA', unit: 'GHZ' })

const sweep = { start: '2.2 GHz', stop: '2.7 GHz', points: 11, spacing: 'linear' }
const twoPorts = {
  format: 'portwright.network', version: 1.1, referenceImpedance: 50, sweep,
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
    { id: 'P2', type: 'port', params: { index: 2 }, layout: { x: 400, y: 0, rotation: 180 } },
  ],
  wires: [],
}

describe('a measured part from upload to exported Touchstone', () => {
  beforeAll(async () => {
    const { client, email } = await newSignedInUser('Round Trip Tester')
    const project = await client.post('/api/projects', { name: `Round trip ${Date.now()}` })
    expect(project.status).toBe(201)
    projectId = project.body.id
    const network = await client.post(`/api/projects/${projectId}/networks`, { name: 'Amplifier round trip', document: twoPorts })
    expect(network.status).toBe(201)
    networkId = network.body.id
    const browser = await signedInBrowser(email, TEST_PASSWORD, { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('uploads, places, wires, shows, exports and reads back the same S-parameters', async () => {
    // Upload through the project page's Files section.
    await page.goto(appUrl(`/projects/${projectId}`))
    await page.waitForSelector('[data-testid="project-files"]')
    await page.setInputFiles('[data-testid="file-input"]', { name: 'amp.s2p', mimeType: 'application/octet-stream', buffer: Buffer.from(ampText, 'latin1') })
    await page.waitForSelector('[data-testid="file-list"] >> text=amp.s2p')

    // Place it in the network and wire it between the two ports.
    await page.goto(appUrl(`/projects/${projectId}/networks/${networkId}`))
    await page.click('[data-testid="rail-data"]')
    await page.click('[data-testid="external-pick-amp.s2p"]')
    await page.waitForSelector('[data-testid="terminal-D1.2"]')
    await page.selectOption('[data-testid="connect-D1.1"]', 'P1.1')
    await page.selectOption('[data-testid="connect-D1.2"]', 'P2.1')
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("2-port")', { timeout: 30_000 })
    expect(await page.$('[data-testid="solve-problems"]')).toBeNull()

    // Its traces in the results (the Response view loads on first use).
    await page.click('[data-testid="view-tab-response"]')
    await page.waitForSelector('[data-testid="response-plot"] canvas', { timeout: 30_000 })
    await page.waitForSelector('[data-testid="traces-S21"][aria-pressed="true"]')
    await page.waitForSelector('[data-testid="traces-S11"][aria-pressed="true"]')
    await screenshot(page, 'data-roundtrip-results')

    // Export Touchstone from the dock (version 1.1, real/imaginary), and read it back.
    await page.getByTestId('export-open').click()
    await page.getByTestId('export-ts-version').selectOption('1.1')
    await page.getByTestId('export-ts-format').selectOption('RI')
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-touchstone').click()])
    expect(download.suggestedFilename()).toMatch(/\.s2p$/)
    const text = readFileSync((await download.path())!, 'utf8')
    expect(text).toContain(`! ${SAFETY_NOTE}`)
    const back = readTouchstone(text, { ports: 2 })

    // The library's solve of the same document with the same file (the contract's solve).
    const document = {
      ...twoPorts,
      blocks: [...twoPorts.blocks, { id: 'D1', type: 'data', params: { file: 'amp.s2p' } }],
      wires: [['D1.1', 'P1.1'], ['D1.2', 'P2.1']],
    }
    const solved = solveDocument(document, { resolveData: () => readTouchstone(ampText, { ports: 2 }) })
    if (!solved.ok) throw new Error(JSON.stringify(solved.problems))
    const expected = solved.result
    expect(back.ports).toBe(2)
    expect(back.impedances).toEqual([50, 50])
    expect(back.frequencies.length).toBe(11)
    for (let k = 0; k < expected.frequencies.length; k++) {
      // The frequency unit is GHz in the file: the reader scales it back to hertz.
      expect(Math.abs(back.frequencies[k]! - expected.frequencies[k]!)).toBeLessThan(1e-3)
    }
    let worst = 0
    for (let x = 0; x < expected.re.length; x++) {
      worst = Math.max(worst, Math.abs(back.re[x]! - expected.re[x]!), Math.abs(back.im[x]! - expected.im[x]!))
    }
    expect(worst).toBeLessThan(1e-9)
    // Not a file of zeros: the amplifier's gain is there (about 15 dB at 2.45 GHz, as the demo file is made).
    const middle = 5 * 4 + 2
    expect(20 * Math.log10(Math.hypot(back.re[middle]!, back.im[middle]!))).toBeGreaterThan(10)
  })
})

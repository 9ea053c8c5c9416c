/**
 * The Array view in a real browser, on the four-beam switch matrix (inputs 1–4, outputs 5–8, elements 0.5 λ apart):
 * the four beams point where a 4-element array with progressive phases of ±45° and ±135° must point, and the
 * choices are saved with the network.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { butlerMatrix4x4 } from '../../shared/examples/index'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'
import { newSignedInUser, TEST_PASSWORD, type ApiClient } from '../support/http'

let page: Page
let close: () => Promise<void>
let client: ApiClient
let apiPath = ''
let networkPath = ''

// Beam directions of an N-element, d-spaced array fed by an N×N beamforming matrix: sin θ_k = (k − ½)·λ/(N·d),
// k = ±1, ±2 (progressive phases ±45°, ±135° for N = 4). Hansen, "Phased Array Antennas", 2nd ed., Wiley 2009,
// Sec. 10.2 (Butler matrix beam positions) [memory]. With N = 4, d = 0.5 λ: sin θ = ±1/4, ±3/4, so
// θ = ±14.4775°, ±48.5904° (derived by hand: asin 0.25, asin 0.75).
const expectedPeaks = [-Math.asin(0.75), -Math.asin(0.25), Math.asin(0.25), Math.asin(0.75)].map(r => (r * 180) / Math.PI)

describe('array view', () => {
  beforeAll(async () => {
    const user = await newSignedInUser('Array Tester')
    client = user.client
    const project = await client.post('/api/projects', { name: `Array ${Date.now()}` })
    expect(project.status).toBe(201)
    const network = await client.post(`/api/projects/${project.body.id}/networks`, { name: 'Four-beam switch matrix', document: butlerMatrix4x4 })
    expect(network.status).toBe(201)
    apiPath = `/api/projects/${project.body.id}/networks/${network.body.id}`
    networkPath = `/projects/${project.body.id}/networks/${network.body.id}`
    const browser = await signedInBrowser(user.email, TEST_PASSWORD, { width: 1500, height: 1100 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('shows four beams near ±14.5° and ±48.6° with their figures, and keeps the choices with the network', async () => {
    await page.goto(appUrl(networkPath))
    await page.click('[data-testid="view-tab-array"]')
    await page.waitForSelector('[data-testid="array-figures"]')
    expect(await page.inputValue('[data-testid="array-inputs"]')).toBe('1, 2, 3, 4')
    expect(await page.inputValue('[data-testid="array-outputs"]')).toBe('5, 6, 7, 8')
    expect(await page.textContent('[data-testid="array-frequency-value"]')).toContain('2.45')
    const peaks = await page.$$eval('[data-testid="array-peak"]', cells => cells.map(c => Number((c.textContent ?? '').replace('−', '-').replace('°', ''))))
    expect(peaks).toHaveLength(4)
    const sorted = [...peaks].sort((a, b) => a - b)
    sorted.forEach((p, i) => expect(Math.abs(p - expectedPeaks[i]!)).toBeLessThan(0.5))
    // The same deepest crossing as `npm run -s beams` prints for these choices (−3.697993 dB; both from shared/beams).
    expect(await page.textContent('[data-testid="array-crossover"]')).toContain('−3.70 dB')
    expect(await page.$$eval('[data-testid="array-polar"] [data-polar-trace]', ps => ps.length)).toBe(4)
    expect(await page.$('[data-testid="array-cartesian"] canvas')).not.toBeNull()
    expect(await page.$('[data-testid="array-peak-sweep"] canvas')).not.toBeNull()
    await page.locator('[data-testid="array-figures"]').scrollIntoViewIfNeeded()
    await screenshot(page, 'array-view')

    // Other choices are saved with the network and come back on a reload.
    await page.selectOption('[data-testid="array-element"]', 'cos')
    await page.fill('[data-testid="array-spacing"]', '0.6')
    await expect.poll(async () => (await client.get(apiPath)).body.document.view?.array, { timeout: 15_000 })
      .toMatchObject({ inputs: [1, 2, 3, 4], outputs: [5, 6, 7, 8], spacing: 0.6, spacingUnit: 'wavelengths', elementExponent: 1 })
    await page.reload()
    await page.click('[data-testid="view-tab-array"]')
    await page.waitForSelector('[data-testid="array-figures"]')
    expect(await page.inputValue('[data-testid="array-spacing"]')).toBe('0.6')
    expect(await page.inputValue('[data-testid="array-element"]')).toBe('cos')
    await screenshot(page, 'array-view-cos')
  })

  it('names a wrong port list instead of drawing', async () => {
    await page.fill('[data-testid="array-outputs"]', '5, 6, 9')
    expect(await page.textContent('[data-testid="array-problems"]')).toContain('Outputs: port 9 does not exist (the network has 8 ports).')
  })
})

/**
 * A snapshot's pages solve it from what it froze: after the inner network is edited and the data file
 * replaced, the snapshot page's results table, its report and the compare plot still show the old
 * chain, while the live network shows the new one.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'
import { fileForm, newSignedInUser, TEST_PASSWORD, type ApiClient } from '../support/http'

// Invented matched pads of our own: |S21| = 0.5 (version 1), then 0.25 (version 2), 1–3 GHz.
const pad = (gain: number) => `! Quillmere pad\n# GHZ S MA R 50\n1 0 0 ${gain} 0 ${gain} 0 0 0\n2 0 0 ${gain} -10 ${gain} -10 0 0\n3 0 0 ${gain} -20 ${gain} -20 0 0\n`
const sweep = { start: '1 GHz', stop: '3 GHz', points: 3, spacing: 'linear' }
const inner = (db: number) => ({
  format: 'portwright.network', version: 1.1, name: 'Inner pad', referenceImpedance: 50, variables: { f0: '2 GHz' }, sweep,
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } }, { id: 'P2', type: 'port', params: { index: 2 }, layout: { x: 480, y: 0, rotation: 180 } },
    { id: 'DA1', type: 'data', params: { file: 'pad.s2p' }, layout: { x: 120, y: 0 } }, { id: 'AT1', type: 'attenuator', params: { db }, layout: { x: 300, y: 0 } },
  ],
  wires: [['P1.1', 'DA1.1'], ['DA1.2', 'AT1.1'], ['AT1.2', 'P2.1']],
})
const outer = {
  format: 'portwright.network', version: 1.1, name: 'Outer chain', referenceImpedance: 50, variables: { f0: '2 GHz' }, sweep,
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } }, { id: 'P2', type: 'port', params: { index: 2 }, layout: { x: 400, y: 0, rotation: 180 } },
    { id: 'SN1', type: 'subnetwork', params: { network: 'Inner pad' }, layout: { x: 160, y: 0 } },
  ],
  wires: [['P1.1', 'SN1.1'], ['SN1.2', 'P2.1']],
}
// Matched two-ports in cascade multiply |S21| (derived by hand): 20·log10(0.5) − 3 = −9.02 dB frozen;
// 20·log10(0.25) − 10 = −22.04 dB live (an attenuator of A dB is −A dB, common practice).
const FROZEN_DB = 20 * Math.log10(0.5) - 3
const LIVE_DB = 20 * Math.log10(0.25) - 10

let page: Page
let close: () => Promise<void>
let owner: ApiClient
let base = ''
let outerId = ''
let snapshotId = ''

/** S21 in dB from the results table's row at this frequency text (the Table view loads on first use). */
async function s21At(frequency: string): Promise<number> {
  await page.click('[data-testid="view-tab-table"]')
  await page.waitForSelector('[data-testid="results-table"] tbody tr', { timeout: 30_000 })
  const header = await page.$$eval('[data-testid="results-table"] thead th', ths => ths.map(th => th.textContent?.trim() ?? ''))
  const rows = await page.$$eval('[data-testid="results-table"] tbody tr', trs => trs.map(tr => [...tr.querySelectorAll('td')].map(td => td.textContent?.trim() ?? '')))
  const row = rows.find(r => r[0] === frequency)
  if (!row) throw new Error(`no row at ${frequency}: ${rows.map(r => r[0]).join(', ')}`)
  return Number(row[header.indexOf('S21 dB')]!.replace('−', '-'))
}

describe('a snapshot shows what it froze', () => {
  beforeAll(async () => {
    const made = await newSignedInUser('Frozen Page Tester')
    owner = made.client
    const projectId = (await owner.post('/api/projects', { name: `Frozen pages ${Date.now()}` })).body.id
    base = `/api/projects/${projectId}`
    const file = await owner.request('POST', `${base}/files`, fileForm('pad.s2p', pad(0.5)))
    expect(file.status).toBe(201)
    const innerMade = await owner.post(`${base}/networks`, { name: 'Inner pad', document: inner(3) })
    expect(innerMade.status).toBe(201)
    const outerMade = await owner.post(`${base}/networks`, { name: 'Outer chain', document: outer })
    expect(outerMade.status).toBe(201)
    outerId = outerMade.body.id
    const snapshot = await owner.post(`${base}/networks/${outerId}/snapshots`, { title: 'Frozen chain' })
    expect(snapshot.status).toBe(201)
    snapshotId = snapshot.body.id
    // Then the inner network and the file change.
    const current = await owner.get(`${base}/networks/${innerMade.body.id}`)
    expect((await owner.put(`${base}/networks/${innerMade.body.id}`, { revision: current.body.revision, document: inner(10) })).status).toBe(200)
    expect((await owner.request('PUT', `${base}/files/${file.body.id}`, fileForm('pad.s2p', pad(0.25)))).status).toBe(200)
    const browser = await signedInBrowser(made.email, TEST_PASSWORD, { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('the snapshot page solves from its frozen copies, the live editor from the new ones', async () => {
    await page.goto(appUrl(`${base.replace('/api', '')}/snapshots/${outerId}/${snapshotId}`))
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("2-port")', { timeout: 30_000 })
    expect(await s21At('2.000 GHz')).toBeCloseTo(FROZEN_DB, 2)
    expect(await page.getByTestId('snapshot-frozen-parts').textContent()).toBe('with 1 inner network and 1 data file as frozen')
    await screenshot(page, 'snapshot-frozen-page')

    await page.goto(appUrl(`${base.replace('/api', '')}/networks/${outerId}`))
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("2-port")', { timeout: 30_000 })
    expect(await s21At('2.000 GHz')).toBeCloseTo(LIVE_DB, 2)
  })

  it('the snapshot\'s report and the compare plot use the frozen copies too', async () => {
    await page.goto(appUrl(`${base.replace('/api', '')}/report/${outerId}?snapshot=${snapshotId}`))
    await page.getByTestId('report-figures').getByText('S21').first().waitFor({ timeout: 30_000 })
    expect(await page.getByTestId('report-figures').textContent()).toContain('S21 −9.02 dB')
    // The report's own solve reaches the inner network and the file: plots and no problems.
    await page.getByTestId('report-response').locator('svg').waitFor({ timeout: 30_000 })
    expect(await page.getByTestId('report-problems').textContent()).toContain('None: the network solves')
    // The live network's report figures come from the new inner network and file.
    await page.goto(appUrl(`${base.replace('/api', '')}/report/${outerId}`))
    await page.getByTestId('report-response').locator('svg').waitFor({ timeout: 30_000 })
    expect(await page.getByTestId('report-figures').textContent()).toContain('S21 −22.04 dB')

    await page.goto(appUrl(`${base.replace('/api', '')}/snapshots/${outerId}/compare?before=${snapshotId}&after=live`))
    await page.getByTestId('overlay-quantity').waitFor({ timeout: 30_000 })
    expect(await page.getByTestId('overlay-plot').textContent()).not.toMatch(/cannot be solved|not found/)
    await screenshot(page, 'snapshot-frozen-compare')
  })
})

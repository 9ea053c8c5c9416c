/**
 * Data files and sub-networks in the editor, in a real browser: an uploaded Touchstone file placed as
 * a data block from the rail, wired to two ports and solved in the page (the numbers read back from the
 * results table equal the library's solve of the same document); a sub-network whose terminals are
 * named after the inner ports, opened inside and left by the back link; and a cycle of sub-networks
 * refused with the chain named.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { inventedAmplifier } from '../../server/database/seeders/demo-touchstone'
import { solveDocument } from '../../shared/solver'
import { readTouchstone } from '../../shared/touchstone/read'
import { writeTouchstone } from '../../shared/touchstone/write'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'
import { fileForm, newSignedInUser, TEST_PASSWORD } from '../support/http'

let page: Page
let close: () => Promise<void>
let projectId = ''
let owner: Awaited<ReturnType<typeof newSignedInUser>>['client']
const ids: Record<string, string> = {}
const ampText = writeTouchstone(inventedAmplifier(), { format: 'DB', unit: 'GHZ' })

const sweep = { start: '2.2 GHz', stop: '2.7 GHz', points: 11, spacing: 'linear' }
const twoPorts = {
  format: 'portwright.network', version: 1.1, referenceImpedance: 50, sweep,
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
    { id: 'P2', type: 'port', params: { index: 2 }, layout: { x: 400, y: 0, rotation: 180 } },
  ],
  wires: [],
}
const pad = {
  ...twoPorts,
  blocks: [
    { id: 'IN', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
    { id: 'OUT', type: 'port', params: { index: 2 }, layout: { x: 300, y: 0, rotation: 180 } },
    { id: 'PAD', type: 'attenuator', params: { db: 3 }, layout: { x: 120, y: 0 } },
  ],
  wires: [['IN.1', 'PAD.1'], ['PAD.2', 'OUT.1']],
}
const loop = (other: string) => ({ ...twoPorts, blocks: [...twoPorts.blocks, { id: 'SN1', type: 'subnetwork', params: { network: other }, layout: { x: 160, y: 0 } }], wires: [['P1.1', 'SN1.1'], ['SN1.2', 'P2.1']] })

/** The results table's columns by heading, at the row of this frequency text. */
async function tableRow(frequency: string): Promise<Record<string, number>> {
  // Views other than Response load on first use: wait for the table's rows before reading them.
  await page.waitForSelector('[data-testid="results-table"] tbody tr')
  const header = await page.$$eval('[data-testid="results-table"] thead th', ths => ths.map(th => th.textContent?.trim() ?? ''))
  const rows = await page.$$eval('[data-testid="results-table"] tbody tr', trs => trs.map(tr => [...tr.querySelectorAll('td')].map(td => td.textContent?.trim() ?? '')))
  const row = rows.find(r => r[0] === frequency)
  if (!row) throw new Error(`no row at ${frequency}: ${rows.map(r => r[0]).join(', ')}`)
  return Object.fromEntries(header.slice(1).map((h, i) => [h, Number(row[i + 1]!.replace('−', '-'))]))
}

describe('data files and sub-networks in the editor', () => {
  beforeAll(async () => {
    const { client, email } = await newSignedInUser('Data Block Tester')
    owner = client
    const project = await client.post('/api/projects', { name: `Measured parts ${Date.now()}` })
    expect(project.status).toBe(201)
    projectId = project.body.id
    const upload = await client.request('POST', `/api/projects/${projectId}/files`, fileForm('amp.s2p', ampText))
    expect(upload.status).toBe(201)
    for (const [name, document] of [['Amplifier check', twoPorts], ['Inner pad', pad], ['Loop A', loop('Loop B')], ['Loop B', loop('Loop A')], ['Pad inside', pad], ['Pad outside', loop('Pad inside')]] as const) {
      const answer = await client.post(`/api/projects/${projectId}/networks`, { name, document })
      expect(answer.status).toBe(201)
      ids[name] = answer.body.id
    }
    const browser = await signedInBrowser(email, TEST_PASSWORD, { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
  })
  afterAll(async () => { await close?.() })

  it('places an uploaded file as a data block, wires it to two ports and solves it in the page', async () => {
    await page.goto(appUrl(`/projects/${projectId}/networks/${ids['Amplifier check']}`))
    await page.click('[data-testid="rail-data"]')
    await page.click('[data-testid="external-pick-amp.s2p"]')
    await page.waitForSelector('[data-testid="block-D1"]')
    // Two terminals, numbered, from the file's summary.
    await page.waitForSelector('[data-testid="terminal-D1.2"]')
    expect(await page.$('[data-testid="terminal-D1.3"]')).toBeNull()
    expect(await page.textContent('[data-testid="data-summary-ports"]')).toBe('2')
    expect(await page.textContent('[data-testid="data-summary"]')).toContain('2.000 GHz to 2.900 GHz')
    await page.waitForSelector('[data-testid="data-preview"] canvas')
    await page.selectOption('[data-testid="connect-D1.1"]', 'P1.1')
    await page.selectOption('[data-testid="connect-D1.2"]', 'P2.1')
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("2-port")')
    expect(await page.$('[data-testid="solve-problems"]')).toBeNull()
    await screenshot(page, 'data-block-placed')

    // The page's solve read back through the results table equals the library's, to its printed digits.
    await page.click('[data-testid="view-tab-table"]')
    await page.waitForSelector('[data-testid="results-table"]')
    const shown = await tableRow('2.450 GHz')
    const document = { ...twoPorts, blocks: [...twoPorts.blocks, { id: 'D1', type: 'data', params: { file: 'amp.s2p' } }], wires: [['D1.1', 'P1.1'], ['D1.2', 'P2.1']] }
    const solved = solveDocument(document, { resolveData: () => readTouchstone(ampText, { ports: 2 }), sweep: { start: 2.45e9, stop: 2.45e9, points: 1 } })
    if (!solved.ok) throw new Error(JSON.stringify(solved.problems))
    const db = (i: number) => 20 * Math.log10(Math.hypot(solved.result.re[i]!, solved.result.im[i]!))
    expect(shown['S11 dB']).toBeCloseTo(db(0), 1)
    expect(shown['S21 dB']).toBeCloseTo(db(2), 1)
    // The invented amplifier: gain about 15 dB, input match about −6 dB at its centre.
    expect(shown['S21 dB']).toBeCloseTo(15, 0)
    expect(shown['S11 dB']).toBeCloseTo(-6, 0)
    await page.click('[data-testid="view-tab-response"]')
    await page.waitForSelector('[data-testid="response-plot"]')
    await screenshot(page, 'data-block-results')
  })

  it('uses another network as a sub-network, opens it inside and comes back', async () => {
    await page.click('[data-testid="rail-subnetwork"]')
    // The network being edited is not offered.
    await page.waitForSelector('[data-testid="external-pick-Inner pad"]')
    expect(await page.$('[data-testid="external-pick-Amplifier check"]')).toBeNull()
    await page.click('[data-testid="external-pick-Inner pad"]')
    await page.waitForSelector('[data-testid="terminal-role-SN1.2"]')
    expect(await page.textContent('[data-testid="terminal-role-SN1.1"]')).toBe('IN')
    expect(await page.textContent('[data-testid="terminal-role-SN1.2"]')).toBe('OUT')
    await page.waitForSelector('[data-testid="subnetwork-ports"]')
    await screenshot(page, 'data-block-subnetwork')
    await page.click('[data-testid="subnetwork-open"]')
    await page.waitForURL(new RegExp(`/networks/${ids['Inner pad']}`))
    await page.waitForSelector('[data-testid="back-to-outer"]:has-text("Amplifier check")')
    await page.click('[data-testid="back-to-outer"]')
    await page.waitForURL(new RegExp(`/networks/${ids['Amplifier check']}$`))
    await page.waitForSelector('[data-testid="block-SN1"]')
  })

  it('refuses a cycle of sub-networks, naming the chain', async () => {
    await page.goto(appUrl(`/projects/${projectId}/networks/${ids['Loop A']}`))
    await expect.poll(() => page.textContent('[data-testid="solve-problems"]').catch(() => ''), { timeout: 20_000 }).toContain('Loop B → Loop A → Loop B')
    await screenshot(page, 'data-block-cycle')
  })

  it('solves through a sub-network, and again with its edit after Read again', async () => {
    await page.goto(appUrl(`/projects/${projectId}/networks/${ids['Pad outside']}`))
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("2-port")')
    await page.click('[data-testid="view-tab-table"]')
    // A matched 3 dB pad inside: S21 = −3 dB (the attenuator's definition).
    await expect.poll(async () => (await tableRow('2.450 GHz'))['S21 dB']).toBeCloseTo(-3, 2)
    const inner = await owner.get(`/api/projects/${projectId}/networks/${ids['Pad inside']}`)
    const edited = { ...inner.body.document, blocks: inner.body.document.blocks.map((b: { id: string }) => (b.id === 'PAD' ? { ...b, params: { db: 6 } } : b)) }
    expect((await owner.put(`/api/projects/${projectId}/networks/${ids['Pad inside']}`, { document: edited, revision: inner.body.revision })).status).toBe(200)
    await page.click('[data-testid="block-SN1"]')
    await page.click('[data-testid="subnetwork-refresh"]')
    await expect.poll(async () => (await tableRow('2.450 GHz'))['S21 dB']).toBeCloseTo(-6, 2)
  })

  it('opens the demo balanced amplifier read-only for a reviewer, matched where one stage is not', async () => {
    // Ines reviews the demo project: no rail, the data file cannot be changed, the page still solves.
    await close()
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026', { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
    await page.goto(appUrl('/'))
    await page.click('text=Balanced LNA hybrids')
    await page.click('text=Balanced amplifier (invented LNA data)')
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("2-port")')
    expect(await page.$('[data-testid="block-rail"]')).toBeNull()
    await page.click('[data-testid="block-AMP_A"]')
    await page.waitForSelector('[data-testid="data-summary"]')
    expect(await page.isDisabled('[data-testid="data-file-select"]')).toBe(true)
    await page.waitForSelector('[data-testid="data-preview"] canvas')
    await screenshot(page, 'data-block-balanced')
    await page.click('[data-testid="view-tab-table"]')
    const shown = await tableRow('2.450 GHz')
    // Ideal hybrids around two equal stages: the reflections cancel at the input (derived by hand), the gain stays 15 dB.
    expect(shown['S11 dB']).toBeLessThan(-6 - 15)
    expect(shown['S21 dB']).toBeCloseTo(15, 0)
  })
})

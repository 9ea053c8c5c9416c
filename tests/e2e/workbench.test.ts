/**
 * The editor's workbench in a real browser: entries that do not evaluate stay
 * drafts beside the kept value (also after a reload), many-port results stay
 * readable, a log sweep is drawn on a log axis, and the spec is saved in the
 * document. Screenshots go to test-results/screenshots/.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { appUrl } from '../support/app'
import { launchBrowser, screenshot, signIn, signedInBrowser } from '../support/browser'

let page: Page
let close: () => Promise<void>
let projectId = ''

interface NetworkBody { id: string, document: Record<string, any> }

/** Calls the app's API from inside the signed-in page (same origin, its cookie). */
async function api<T>(path: string, init?: { method: string, body: unknown }): Promise<T> {
  return page.evaluate(async ({ path, init }) => {
    const response = await fetch(path, init ? { method: init.method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(init.body) } : undefined)
    if (!response.ok) throw new Error(`${path}: ${response.status} ${await response.text()}`)
    return response.json()
  }, { path, init }) as Promise<T>
}

async function createNetwork(name: string, document: unknown): Promise<string> {
  const created = await api<{ id: string }>(`/api/projects/${projectId}/networks`, { method: 'POST', body: { name, document } })
  return created.id
}

async function openNetwork(id: string) {
  await page.goto(appUrl(`/projects/${projectId}/networks/${id}`))
  await page.waitForSelector('[data-testid="canvas"]')
  await expect.poll(() => page.getAttribute('[data-testid="live-status"]', 'data-status'), { timeout: 15_000 }).toBe('live')
}

async function storedDocument(id: string): Promise<Record<string, any>> {
  return (await api<NetworkBody>(`/api/projects/${projectId}/networks/${id}`)).document
}

/** A quarter-wave 70.7 Ω line between a port and a 100 Ω load (an ideal quarter-wave match at 2 GHz). */
function quarterWaveDocument(sweep: Record<string, unknown> = { start: '1 GHz', stop: '3 GHz', points: 101, spacing: 'linear' }) {
  return {
    format: 'portwright.network', version: 1, name: 'Quarter-wave check', referenceImpedance: 50,
    variables: { f0: '2 GHz' }, sweep,
    blocks: [
      { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
      { id: 'TL1', type: 'line', params: { impedance: 70.7, degrees: 90, at: 'f0' }, layout: { x: 120, y: 0 } },
      { id: 'RL1', type: 'load', params: { resistance: 100 }, layout: { x: 280, y: 0 } },
    ],
    wires: [['P1.1', 'TL1.1'], ['TL1.2', 'RL1.1']],
  }
}

async function selectBlock(id: string) {
  await page.click(`[data-testid="block-${id}"]`)
  await page.waitForSelector(`[data-testid="connect-${id}.1"]`)
}

describe('editor workbench', () => {
  beforeAll(async () => {
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026', { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
    const projects = await api<Array<{ id: string, name: string }>>('/api/projects')
    projectId = projects.find(p => p.name === 'Beam-switch feed, S-band')!.id
  })
  afterAll(async () => { await close?.() })

  it('keeps an entry that does not evaluate as a draft beside the kept value, across a reload, until it evaluates', async () => {
    const id = await createNetwork(`Draft check ${Date.now()}`, quarterWaveDocument())
    await openNetwork(id)
    await selectBlock('TL1')
    await page.fill('[data-testid="param-impedance"]', 'Zq')
    await expect.poll(() => page.textContent('[data-testid="param-impedance-draft"]')).toBe('Impedance "Zq" uses the unknown name Zq')
    await expect.poll(() => page.textContent('[data-testid="param-impedance-kept"]')).toContain('keeps 70.7 Ω')
    await page.fill('[data-testid="param-degrees"]', '1e400')
    await expect.poll(() => page.textContent('[data-testid="param-degrees-draft"]')).toContain('is too large to be a number')
    await page.fill('[data-testid="param-at"]', '')
    await expect.poll(() => page.textContent('[data-testid="param-at-draft"]')).toContain('is empty: enter a value such as 2.45 GHz')
    await screenshot(page, 'workbench-draft')

    await page.reload()
    await page.waitForSelector('[data-testid="block-TL1"]')
    // The live document replaces the one the page opened with (and the selection with it): wait for it.
    await expect.poll(() => page.getAttribute('[data-testid="live-status"]', 'data-status'), { timeout: 15_000 }).toBe('live')
    await selectBlock('TL1')
    expect(await page.inputValue('[data-testid="param-impedance"]')).toBe('Zq')
    expect(await page.textContent('[data-testid="param-impedance-draft"]')).toContain('unknown name Zq')
    const kept = await storedDocument(id)
    const line = kept.blocks.find((b: { id: string }) => b.id === 'TL1')
    expect(line.params).toEqual({ impedance: 70.7, degrees: 90, at: 'f0' })

    // Points that are not a whole number are refused with a message, never ignored.
    await page.click('[data-testid="open-settings"]')
    await page.fill('[data-testid="sweep-points"]', '2.5')
    await expect.poll(() => page.textContent('[data-testid="sweep-points-draft"]')).toContain('must be a whole number')
    await page.press('[data-testid="sweep-points"]', 'Escape')
    // Defining the name the draft uses lets it through.
    await page.click('[data-testid="variable-add"]')
    await page.fill('[data-testid="variables"] tr:last-child input >> nth=0', 'Zq')
    await page.press('[data-testid="variables"] tr:last-child input >> nth=0', 'Enter')
    await page.fill('[data-testid="variable-Zq-expression"]', '70.7 ohm')
    await page.click('[data-testid="settings-close"]')
    await selectBlock('TL1')
    await expect.poll(() => page.getAttribute('[data-testid="param-impedance"]', 'data-draft')).toBeNull()
    await expect.poll(async () => (await storedDocument(id)).blocks.find((b: { id: string }) => b.id === 'TL1').params.impedance, { timeout: 15_000 }).toBe('Zq')
  })

  it('shows an 8-port result through a folded trace grid, with the plot keeping most of the dock', async () => {
    const networks = await api<Array<{ id: string, name: string }>>(`/api/projects/${projectId}/networks`)
    const matrix = networks.find(n => n.name.startsWith('Four-beam switch matrix'))!
    const document = await storedDocument(matrix.id)
    const id = await createNetwork(`Matrix view ${Date.now()}`, document)
    await openNetwork(id)
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("8-port")')
    await screenshot(page, 'workbench-8-port')
    const dock = (await page.locator('[data-testid="results-dock"]').boundingBox())!
    const plot = (await page.locator('[data-testid="response-plot"]').boundingBox())!
    expect(plot.height / dock.height).toBeGreaterThan(0.7)
    // Defaults for a many-port network: every reflection and the first input to every output.
    expect(await page.textContent('[data-testid="traces-open"]')).toContain('S11, S22 and 13 more')
    await page.click('[data-testid="traces-open"]')
    await page.waitForSelector('[data-testid="traces-grid"]')
    expect(await page.locator('[data-testid="traces-grid"] td button').count()).toBe(64)
    await screenshot(page, 'workbench-8-port-grid')
    await page.click('[data-testid="traces-clear"]')
    await page.click('[data-testid="traces-from-2"]')
    expect(await page.getAttribute('[data-testid="traces-S52"]', 'aria-pressed')).toBe('true')
    expect(await page.getAttribute('[data-testid="traces-S51"]', 'aria-pressed')).toBe('false')
    await page.keyboard.press('Escape')
    await page.mouse.click(5, 5)
    await screenshot(page, 'workbench-8-port-plot')
  })

  it('draws a log sweep on a log axis spanning the sweep, with 1-2-5 ticks, and saves markers with the network', async () => {
    const id = await createNetwork(`Log sweep ${Date.now()}`, quarterWaveDocument({ start: '10 MHz', stop: '10 GHz', points: 301, spacing: 'log' }))
    await openNetwork(id)
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("1-port")')
    const ticks = (await page.getAttribute('[data-testid="response-plot"]', 'data-x-ticks'))!.split(', ')
    expect(ticks[0]).toBe('10 MHz')
    expect(ticks.at(-1)).toBe('10 GHz')
    for (const t of ['20 MHz', '50 MHz', '100 MHz', '200 MHz', '500 MHz', '1 GHz', '2 GHz', '5 GHz']) expect(ticks).toContain(t)
    expect(ticks).toHaveLength(10)
    // Two markers: the readout follows the plotted quantity and gives their difference.
    await page.keyboard.press('Escape')
    await page.keyboard.press('m')
    await page.fill('[data-testid="readout-m1-frequency"]', '2 GHz')
    await page.press('[data-testid="readout-m1-frequency"]', 'Enter')
    await page.keyboard.press('Escape')
    await page.keyboard.press('m')
    await page.fill('[data-testid="readout-m2-frequency"]', '1 GHz')
    await page.press('[data-testid="readout-m2-frequency"]', 'Enter')
    await page.waitForSelector('[data-testid="readout-delta"]')
    await page.selectOption('[data-testid="response-quantity"]', 'vswr')
    await expect.poll(() => page.textContent('[data-testid="readout-m1-S11-vswr"]')).toMatch(/^\d+\.\d{3}$/)
    await page.locator('[data-testid="results-dock"]').screenshot({ path: 'test-results/screenshots/workbench-log-axis.png' })
    await expect.poll(async () => ((await storedDocument(id)).view?.markers ?? []).length, { timeout: 15_000 }).toBe(2)
    await page.reload()
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("1-port")')
    await expect.poll(() => page.locator('[data-testid^="readout-m"][data-testid$="-frequency"]').count()).toBe(2)
  })

  it('keeps the spec in the document: first defaults from the network, version 1.1, edits saved', async () => {
    const networks = await api<Array<{ id: string, name: string }>>(`/api/projects/${projectId}/networks`)
    const hybrid = networks.find(n => n.name.startsWith('Quadrature split'))!
    const document = await storedDocument(hybrid.id)
    delete document.spec
    const id = await createNetwork(`Spec check ${Date.now()}`, { ...document, version: 1 })
    await openNetwork(id)
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("4-port")')
    await page.click('[data-testid="view-tab-spec"]')
    await page.click('[data-testid="spec-create"]')
    await page.waitForSelector('[data-testid="spec-form"]')
    await page.fill('[data-testid="spec-condition-0-min"]', '25')
    await page.press('[data-testid="spec-condition-0-min"]', 'Enter')
    await page.locator('[data-testid="results-dock"]').screenshot({ path: 'test-results/screenshots/workbench-spec.png' })
    await expect.poll(async () => (await storedDocument(id)).spec?.conditions?.[0]?.min, { timeout: 15_000 }).toBe(25)
    const saved = await storedDocument(id)
    expect(saved.version).toBe(1.1)
    expect(saved.spec.center).toBe(document.variables?.f0 !== undefined ? 'f0' : expect.any(Number))
    // The branch-line hybrid splits with port 2 leading port 3 by 90° (Pozar, Microwave Engineering, 4th ed., §7.5).
    expect(saved.spec.conditions).toContainEqual({ measure: 'phaseDifference', from: 1, to: [2, 3], target: 90, tolerance: 5 })
    expect(await page.textContent('[data-testid="spec-verdict"]')).toBeTruthy()
  })

  it('tells a viewer the editor is read-only instead of promising saves', async () => {
    const networks = await api<Array<{ id: string, name: string }>>(`/api/projects/${projectId}/networks`)
    const hybrid = networks.find(n => n.name.startsWith('Quadrature split'))!
    const viewer = await launchBrowser()
    try {
      await signIn(viewer.page, 'jun@quillmere.example', 'quillmere-demo-2026')
      await viewer.page.goto(appUrl(`/projects/${projectId}/networks/${hybrid.id}`))
      await viewer.page.waitForSelector('[data-testid="live-status"][data-status="live"]', { timeout: 15_000 })
      const text = await viewer.page.textContent('[data-testid="live-status"]')
      expect(text).toContain('read-only')
      expect(text).not.toContain('saved')
    }
    finally {
      await viewer.close()
    }
  })
})

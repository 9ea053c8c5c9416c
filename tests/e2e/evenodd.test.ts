/**
 * The even/odd view in a real browser: on the demo branch-line (the `hybrid90` branch model) the
 * closed-form half circuits recombine to the full solve, and at f0 the modes are Pozar's
 * (Microwave Engineering, 4th ed., §7.5, eqs. 7.54–7.56 [memory]: Γe = Γo = 0, Te = −(1 + j)/√2,
 * To = (1 − j)/√2). On a ring of lines, marking the wrong mirror pairs is saved in the document
 * (`view.symmetry`) and the check says the network is not mirrored about them.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import ring from '../../shared/examples/ring-hybrid.json'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'

let page: Page
let close: () => Promise<void>
let projectId = ''

async function api<T>(path: string, init?: { method: string, body: unknown }): Promise<T> {
  return page.evaluate(async ({ path, init }) => {
    const response = await fetch(path, init ? { method: init.method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(init.body) } : undefined)
    if (!response.ok) throw new Error(`${path}: ${response.status} ${await response.text()}`)
    return response.json()
  }, { path, init }) as Promise<T>
}

async function openNetwork(id: string) {
  await page.goto(appUrl(`/projects/${projectId}/networks/${id}`))
  await page.waitForSelector('[data-testid="canvas"]')
  await expect.poll(() => page.getAttribute('[data-testid="live-status"]', 'data-status'), { timeout: 15_000 }).toBe('live')
  await page.waitForSelector('[data-testid="results-fresh"]:has-text("4-port")')
  await page.click('[data-testid="view-tab-evenodd"]')
  await page.waitForSelector('[data-testid="view-evenodd"]')
}

describe('even/odd view', () => {
  beforeAll(async () => {
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026', { width: 1500, height: 950 })
    page = browser.page
    close = browser.close
    const projects = await api<Array<{ id: string, name: string }>>('/api/projects')
    projectId = projects.find(p => p.name === 'Beam-switch feed, S-band')!.id
  })
  afterAll(async () => { await close?.() })

  it('shows the demo branch-line\'s half circuits (built from lines), Pozar\'s values at f0, and a check row that says equal', async () => {
    const networks = await api<Array<{ id: string, name: string }>>(`/api/projects/${projectId}/networks`)
    const demo = networks.find(n => n.name.startsWith('Quadrature split, 2.45 GHz'))!
    await openNetwork(demo.id)
    await expect.poll(() => page.textContent('[data-testid="evenodd-check"]')).toContain('equal the full solve')
    expect(await page.textContent('[data-testid="evenodd-pairs-source"]')).toContain('found')
    expect(await page.inputValue('[data-testid="evenodd-pairs"]')).toBe('[[1,4],[2,3]]')
    expect(await page.$('[data-testid="evenodd-drawing-even"] circle')).not.toBeNull()
    expect(await page.$('[data-testid="evenodd-drawing-odd"] circle')).toBeNull()
    // Move to f0 (the demo's sweep may not be centred on it): step the slider until it reads 2.450 GHz.
    const slider = page.locator('[data-testid="evenodd-frequency"]')
    const max = Number(await slider.getAttribute('max'))
    for (let k = 0; k <= max; k++) {
      await slider.fill(String(k))
      if ((await page.textContent('[data-testid="evenodd-frequency-value"]'))?.includes('2.450 GHz')) break
    }
    expect(await page.textContent('[data-testid="evenodd-frequency-value"]')).toContain('2.450 GHz')
    expect(await page.textContent('[data-testid="evenodd-mode-Γe"]')).toContain('0.000 + 0.000j')
    expect(await page.textContent('[data-testid="evenodd-mode-Te"]')).toContain('−0.707 − 0.707j')
    expect(await page.textContent('[data-testid="evenodd-mode-To"]')).toContain('0.707 − 0.707j')
    expect(await page.textContent('[data-testid="evenodd-combine-S21"]')).toContain('0.000 − 0.707j')
    await screenshot(page, 'evenodd-branch-line')
  })

  it('gives the branch model\'s half circuits in closed form, drawn with their stubs, equal to the full solve', async () => {
    const document = {
      format: 'portwright.network', version: 1, name: 'Branch model', referenceImpedance: 50, variables: { f0: '2.45 GHz' },
      sweep: { start: '1.45 GHz', stop: '3.45 GHz', points: 201, spacing: 'linear' },
      blocks: [
        ...[1, 2, 3, 4].map(n => ({ id: `P${n}`, type: 'port', params: { index: n }, layout: { x: n % 2 ? 0 : 360, y: n > 2 ? 200 : 0 } })),
        { id: 'HYB', type: 'hybrid90', params: { model: 'branch', at: 'f0' }, layout: { x: 160, y: 80 } },
      ],
      wires: [['P1.1', 'HYB.1'], ['P2.1', 'HYB.2'], ['P3.1', 'HYB.3'], ['P4.1', 'HYB.4']],
    }
    const created = await api<{ id: string }>(`/api/projects/${projectId}/networks`, { method: 'POST', body: { name: `Branch modes ${Date.now()}`, document } })
    await openNetwork(created.id)
    await expect.poll(() => page.textContent('[data-testid="evenodd-check"]')).toContain('equal the full solve')
    expect(await page.textContent('[data-testid="evenodd-pairs-source"]')).toContain('HYB (branch-line model)')
    expect(await page.textContent('[data-testid="evenodd-abcd"]')).toContain('closed form')
    // The stubs are labelled with their impedance and length: Z0 and 45° (λ/8) for the equal split.
    expect(await page.textContent('[data-testid="evenodd-drawing-odd"]')).toContain('50.00 Ω, 45°')
    await screenshot(page, 'evenodd-branch-model')
  })

  it('saves marked mirror pairs in the document and says when the network is not mirrored about them', async () => {
    const created = await api<{ id: string }>(`/api/projects/${projectId}/networks`, { method: 'POST', body: { name: `Ring modes ${Date.now()}`, document: ring } })
    await openNetwork(created.id)
    await expect.poll(() => page.textContent('[data-testid="evenodd-check"]')).toContain('equal the full solve')
    expect(await page.textContent('[data-testid="evenodd-pairs-source"]')).toContain('found')
    expect(await page.inputValue('[data-testid="evenodd-pairs"]')).toBe('[[1,3],[2,4]]')
    await page.selectOption('[data-testid="evenodd-pairs"]', '[[1,4],[2,3]]')
    await expect.poll(() => page.textContent('[data-testid="evenodd-check"]')).toContain('not equal')
    await expect.poll(async () => (await api<{ document: Record<string, any> }>(`/api/projects/${projectId}/networks/${created.id}`)).document.view?.symmetry, { timeout: 15_000 })
      .toEqual([[1, 4], [2, 3]])
    await screenshot(page, 'evenodd-ring-wrong-pairs')
  })
})

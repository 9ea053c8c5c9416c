/**
 * Tidy in a real browser: the branch-line hybrid template is laid out left to
 * right with one key; wire crossings, counted from the drawn paths, do not
 * grow and come to none; the routes are kept in the document; one undo takes
 * the whole tidy back. Screenshots go to test-results/screenshots/.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'
import { countCrossings, polylineOfPath } from '~~/app/utils/editor/wireCrossings'
import { routeJunctions } from '~~/app/utils/editor/wireRoutes'
import { wireKey } from '~~/app/utils/editor/documentOps'
import { EXAMPLES } from '~~/shared/examples/index'

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

/** The drawn wires as polylines, read from the canvas's SVG paths. */
async function drawnWires(): Promise<Array<Array<readonly [number, number]>>> {
  const paths = await page.$$eval('[data-testid^="wire-"]', els => els.map((el) => {
    const path = el.tagName.toLowerCase() === 'path' ? el : el.querySelector('path')
    return path?.getAttribute('d') ?? ''
  }))
  return paths.filter(Boolean).map(polylineOfPath)
}

describe('tidy on the canvas', () => {
  beforeAll(async () => {
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026')
    page = browser.page
    close = browser.close
    const projects = await api<Array<{ id: string, name: string }>>('/api/projects')
    projectId = projects.find(p => p.name === 'Beam-switch feed, S-band')!.id
  })
  afterAll(async () => { await close?.() })

  it.each([
    ['as the template draws it', (d: any) => d],
    // Ports 2 and 4 swapped on the canvas: the same circuit drawn with its wires across each other.
    ['scrambled', (d: any) => {
      const at = (id: string) => d.blocks.find((b: { id: string }) => b.id === id)
      ;[at('P2').layout, at('P4').layout] = [at('P4').layout, at('P2').layout]
      return d
    }],
  ])('lays the branch-line hybrid (%s) out without crossings, as one undoable change', async (_, arrange) => {
    const template = arrange(JSON.parse(JSON.stringify(EXAMPLES['branch-line-hybrid']!)))
    const created = await api<{ id: string }>(`/api/projects/${projectId}/networks`, { method: 'POST', body: { name: `Tidy check ${Date.now()}`, document: template } })
    await page.goto(appUrl(`/projects/${projectId}/networks/${created.id}`))
    await expect.poll(() => page.getAttribute('[data-testid="live-status"]', 'data-status'), { timeout: 15_000 }).toBe('live')
    await expect.poll(async () => (await drawnWires()).length).toBe(template.wires.length)
    const before = countCrossings(await drawnWires())
    await screenshot(page, `tidy-${_ === 'scrambled' ? 'scrambled-' : ''}before`)

    await page.click('[data-testid="canvas"] .vue-flow__pane')
    await page.keyboard.press('l')
    // The routes and positions reach the document the server keeps.
    await expect.poll(async () => {
      const stored = await api<{ document: { view?: { routes?: Record<string, unknown> } } }>(`/api/projects/${projectId}/networks/${created.id}`)
      return Object.keys(stored.document.view?.routes ?? {}).length
    }, { timeout: 20_000 }).toBe(template.wires.length)
    await expect.poll(() => page.$$eval('[data-testid^="wire-"][data-routed="true"]', els => els.length), { timeout: 15_000 }).toBe(template.wires.length)
    const after = countCrossings(await drawnWires())
    process.stdout.write(`wire crossings on the branch-line hybrid (${_}): ${before} before tidy, ${after} after\n`)
    expect(after).toBeLessThanOrEqual(before)
    expect(after).toBe(0)
    // A dot wherever routed wires of one terminal part ways, as many as the stored routes give.
    const kept = await api<{ document: { wires: Array<[string, string]>, view: { routes: Record<string, Array<[number, number]>> } } }>(`/api/projects/${projectId}/networks/${created.id}`)
    const junctions = routeJunctions(kept.document.wires, kept.document.view.routes, wireKey)
    expect(await page.$$eval('[data-testid="route-junction"]', els => els.length)).toBe(junctions.length)
    await page.waitForTimeout(300)
    await screenshot(page, `tidy-${_ === 'scrambled' ? 'scrambled-' : ''}after`)

    // One undo takes the whole tidy back: the template's own layout and no routes.
    await page.keyboard.press('Control+z')
    await expect.poll(() => page.$$eval('[data-testid^="wire-"][data-routed="true"]', els => els.length)).toBe(0)
    expect(countCrossings(await drawnWires())).toBe(before)
  })
})

/**
 * Offline edits outlive the tab: with the network (and the live server) cut
 * off, an edit is made and the tab closed; a new tab in the same browser
 * profile, with the live server still unreachable, shows the edit from the
 * browser's kept copy; once the live server is reachable again the server's
 * document has it. Screenshots go to test-results/screenshots/.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { BrowserContext, Page, WebSocketRoute } from 'playwright-core'
import { appUrl } from '../support/app'
import { launchBrowser, screenshot, signIn } from '../support/browser'

let context: BrowserContext
let page: Page
let close: () => Promise<void>
let projectId = ''
/** Whether the live server may be reached; the route below refuses it otherwise. */
let liveReachable = true
const openSockets: WebSocketRoute[] = []

async function api<T>(on: Page, path: string, init?: { method: string, body: unknown }): Promise<T> {
  return on.evaluate(async ({ path, init }) => {
    const response = await fetch(path, init ? { method: init.method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(init.body) } : undefined)
    if (!response.ok) throw new Error(`${path}: ${response.status} ${await response.text()}`)
    return response.json()
  }, { path, init }) as Promise<T>
}

const line = (impedance: number) => ({
  format: 'portwright.network',
  version: 1,
  name: 'Offline check',
  referenceImpedance: 50,
  variables: { f0: '2 GHz' },
  sweep: { start: '1 GHz', stop: '3 GHz', points: 11, spacing: 'linear' },
  blocks: [
    { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
    { id: 'LN1', type: 'line', params: { impedance, degrees: 90, at: 'f0' }, layout: { x: 160, y: 0 } },
    { id: 'P2', type: 'port', params: { index: 2 }, layout: { x: 320, y: 0, flip: true } },
  ],
  wires: [['P1.1', 'LN1.1'], ['LN1.2', 'P2.1']],
})

describe('offline edits in the browser', () => {
  beforeAll(async () => {
    const browser = await launchBrowser()
    context = browser.context
    page = browser.page
    close = browser.close
    // Every live connection goes through this route, so the test can cut it (setOffline alone leaves open sockets be).
    await context.routeWebSocket(/\/live\/networks\//, (ws) => {
      if (!liveReachable) { void ws.close({ code: 1006 }).catch(() => {}); return }
      ws.connectToServer()
      openSockets.push(ws)
    })
    await signIn(page, 'ines@quillmere.example', 'quillmere-demo-2026')
    const projects = await api<Array<{ id: string, name: string }>>(page, '/api/projects')
    projectId = projects.find(p => p.name === 'Beam-switch feed, S-band')!.id
  })
  afterAll(async () => { await close?.() })

  it('keeps an edit made offline across a tab close and sends it when back online', async () => {
    const created = await api<{ id: string }>(page, `/api/projects/${projectId}/networks`, { method: 'POST', body: { name: `Offline check ${Date.now()}`, document: line(50) } })
    const url = appUrl(`/projects/${projectId}/networks/${created.id}`)
    await page.goto(url)
    await expect.poll(() => page.getAttribute('[data-testid="live-status"]', 'data-status'), { timeout: 15_000 }).toBe('live')

    // Offline: no HTTP, and the live socket cut.
    await context.setOffline(true)
    liveReachable = false
    for (const ws of openSockets.splice(0)) await ws.close({ code: 1006 }).catch(() => {})
    await expect.poll(() => page.getAttribute('[data-testid="live-status"]', 'data-status'), { timeout: 15_000 }).toBe('offline')

    await page.click('[data-testid="block-LN1"]')
    await page.fill('[data-testid="param-impedance"]', '61')
    await page.press('[data-testid="param-impedance"]', 'Enter')
    await expect.poll(() => page.inputValue('[data-testid="param-impedance"]')).toBe('61')
    // y-indexeddb writes each update as it happens; give the write a moment before the tab goes.
    await page.waitForTimeout(500)
    await page.close()

    // A new tab in the same profile; the live server is still unreachable (the page itself must load over HTTP).
    await context.setOffline(false)
    const again = await context.newPage()
    await again.goto(url)
    await expect.poll(() => again.getAttribute('[data-testid="live-status"]', 'data-status'), { timeout: 20_000 }).toBe('offline')
    await again.click('[data-testid="block-LN1"]')
    await expect.poll(() => again.inputValue('[data-testid="param-impedance"]')).toBe('61')
    const before = await api<{ document: any }>(again, `/api/projects/${projectId}/networks/${created.id}`)
    expect(before.document.blocks.find((b: { id: string }) => b.id === 'LN1').params.impedance).toBe(50)
    await screenshot(again, 'offline-kept-edit')

    // Back online: the kept edit reaches the server.
    liveReachable = true
    await expect.poll(() => again.getAttribute('[data-testid="live-status"]', 'data-status'), { timeout: 20_000 }).toBe('live')
    await expect.poll(async () => (await api<{ document: any }>(again, `/api/projects/${projectId}/networks/${created.id}`)).document.blocks.find((b: { id: string }) => b.id === 'LN1').params.impedance, { timeout: 20_000 }).toBe(61)
  })
})

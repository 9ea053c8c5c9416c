/**
 * The fitted view in a real browser: when the editor opens, every block and
 * its labels (names, terminal roles) lie inside the canvas, also on the right
 * after the block rail has narrowed the canvas; a resize fits the view again
 * until the person pans or zooms, and not after. Screenshots go to
 * test-results/screenshots/.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { appUrl } from '../support/app'
import { screenshot, signedInBrowser } from '../support/browser'
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

/** Blocks whose drawing or labels reach outside the canvas, as "id: side by N px". */
async function blocksOutsideCanvas(): Promise<string[]> {
  return page.evaluate(() => {
    const canvas = document.querySelector('[data-testid="canvas"]')!.getBoundingClientRect()
    const out: string[] = []
    for (const node of document.querySelectorAll<HTMLElement>('.vue-flow__node')) {
      let left = Infinity
      let right = -Infinity
      for (const el of [node, ...node.querySelectorAll('span')]) {
        const r = el.getBoundingClientRect()
        if (!r.width) continue
        left = Math.min(left, r.left)
        right = Math.max(right, r.right)
      }
      const id = node.querySelector('[data-testid^="block-"]')?.getAttribute('data-testid')?.slice(6) ?? node.dataset.id
      if (left < canvas.left) out.push(`${id}: left by ${Math.round(canvas.left - left)} px`)
      if (right > canvas.right) out.push(`${id}: right by ${Math.round(right - canvas.right)} px`)
    }
    return out
  })
}

const viewTransform = () => page.evaluate(() => (document.querySelector('.vue-flow__transformationpane') as HTMLElement).style.transform)

describe('the fitted view of the canvas', () => {
  beforeAll(async () => {
    const browser = await signedInBrowser('ines@quillmere.example', 'quillmere-demo-2026')
    page = browser.page
    close = browser.close
    const projects = await api<Array<{ id: string, name: string }>>('/api/projects')
    projectId = projects.find(p => p.name === 'Beam-switch feed, S-band')!.id
  })
  afterAll(async () => { await close?.() })

  it('shows every block of a wide network with its labels, the output ports on the right included, and refits on a resize until the person zooms', async () => {
    // The 4×4 matrix: inputs on the left, outputs on the right, hybrids with terminal roles between.
    const document = JSON.parse(JSON.stringify(EXAMPLES['butler-matrix-4x4']!))
    const created = await api<{ id: string }>(`/api/projects/${projectId}/networks`, { method: 'POST', body: { name: `Fit check ${Date.now()}`, document } })
    await page.setViewportSize({ width: 1440, height: 900 })
    await page.goto(appUrl(`/projects/${projectId}/networks/${created.id}`))
    await expect.poll(() => page.getAttribute('[data-testid="live-status"]', 'data-status'), { timeout: 15_000 }).toBe('live')
    await page.waitForSelector('[data-testid="results-fresh"]', { timeout: 30_000 })
    expect(await page.locator('.vue-flow__node').count()).toBe(document.blocks.length)
    await expect.poll(blocksOutsideCanvas, { timeout: 5_000 }).toEqual([])
    await screenshot(page, 'canvas-fit-opened')

    // Narrower window, nobody has touched the view: fitted again.
    await page.setViewportSize({ width: 1100, height: 900 })
    await expect.poll(blocksOutsideCanvas, { timeout: 5_000 }).toEqual([])
    await screenshot(page, 'canvas-fit-narrower')

    // Zoomed in by the person: a resize leaves their view as it is.
    const box = (await page.locator('[data-testid="canvas"]').boundingBox())!
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2)
    for (let k = 0; k < 4; k++) await page.mouse.wheel(0, -100)
    await page.waitForTimeout(500)
    const zoomed = await viewTransform()
    await page.setViewportSize({ width: 1440, height: 900 })
    await page.waitForTimeout(800)
    expect(await viewTransform()).toBe(zoomed)
  })
})

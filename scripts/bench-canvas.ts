/**
 * Browser benchmark of the editor canvas: a 500-block network (two ports and
 * 498 line sections in one chain, laid out in rows) is panned by dragging the
 * pane and zoomed with the mouse wheel for a few seconds each, and the frames
 * the page paints are counted with requestAnimationFrame inside the page.
 * Prints frames per second (mean) and the frame time of the slowest 5 % of
 * frames. Not a test: it prints figures.
 *
 *   PORTWRIGHT_URL=http://127.0.0.1:3000 npx tsx scripts/bench-canvas.ts [--blocks 500] [--seconds 4]
 *
 * Needs a running app with the demo data (npm start). Headless Chromium here
 * has no GPU (software compositing): a pessimistic measure of a desktop browser.
 */
import { loadavg } from 'node:os'
import type { Page } from 'playwright-core'
import { benchProject, createNetwork, deleteNetwork, freshContext, waitInPage, launchBenchBrowser, percentile, signIn } from './lib/bench-browser'

const base = (process.env.PORTWRIGHT_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '')
function arg(name: string, fallback: number): number {
  const at = process.argv.indexOf(`--${name}`)
  return at > 0 ? Number(process.argv[at + 1]) : fallback
}
const blockCount = arg('blocks', 500)
const seconds = arg('seconds', 4)

/** Two ports and `count - 2` line sections in cascade, 25 to a row: one long chain of `count` blocks. */
function chainDocument(name: string, count: number) {
  const perRow = 25
  const at = (k: number) => ({ x: 120 * (k % perRow), y: 100 * Math.floor(k / perRow) })
  const blocks: Array<Record<string, unknown>> = [{ id: 'P1', type: 'port', params: { index: 1 }, layout: at(0) }]
  const wires: Array<[string, string]> = []
  let previous = 'P1.1'
  for (let k = 1; k <= count - 2; k++) {
    blocks.push({ id: `TL${k}`, type: 'line', params: { impedance: k % 2 ? 'Za' : 'Zb', degrees: 90, at: 'f0' }, layout: at(k) })
    wires.push([previous, `TL${k}.1`])
    previous = `TL${k}.2`
  }
  blocks.push({ id: 'P2', type: 'port', params: { index: 2 }, layout: at(count - 1) })
  wires.push([previous, 'P2.1'])
  return {
    format: 'portwright.network', version: 1, name, referenceImpedance: 50,
    variables: { f0: '2 GHz', Za: '45 ohm', Zb: '55 ohm' },
    sweep: { start: '1 GHz', stop: '3 GHz', points: 101, spacing: 'linear' },
    blocks, wires,
  }
}

/** Starts counting frames in the page; the returned function stops and hands back the frame times (ms). */
async function countFrames(page: Page): Promise<() => Promise<number[]>> {
  await page.evaluate(`(() => {
    const w = window
    w.__frames = []
    w.__counting = true
    let last = performance.now()
    const tick = (t) => {
      if (!w.__counting) return
      w.__frames.push(t - last)
      last = t
      requestAnimationFrame(tick)
    }
    requestAnimationFrame((t) => { last = t; requestAnimationFrame(tick) })
  })()`)
  return async () => page.evaluate(`(() => { window.__counting = false; return window.__frames })()`) as Promise<number[]>
}

function summary(frames: number[]) {
  const total = frames.reduce((a, b) => a + b, 0)
  const sorted = [...frames].sort((a, b) => a - b)
  return {
    frames: frames.length,
    meanFps: +(1000 * frames.length / total).toFixed(1),
    p95FrameMs: +percentile(sorted, 0.95).toFixed(1),
    worstFrameMs: +(sorted.at(-1) ?? Number.NaN).toFixed(1),
  }
}

/** The canvas zoom, read from the transform Vue Flow puts on its viewport. */
async function viewScale(page: Page): Promise<number> {
  const transform = await page.evaluate(`document.querySelector('.vue-flow__transformationpane')?.style.transform ?? ''`) as string
  return Number(/scale\(([0-9.]+)\)/.exec(transform)?.[1] ?? Number.NaN)
}

/** Drags the pane back and forth across the middle of the canvas for `ms`. */
async function pan(page: Page, box: { x: number, y: number, width: number, height: number }, ms: number): Promise<void> {
  const cx = box.x + box.width / 2
  const cy = box.y + box.height / 2
  const end = Date.now() + ms
  let direction = 1
  while (Date.now() < end) {
    await page.mouse.move(cx - 200 * direction, cy - 100 * direction)
    await page.mouse.down()
    // 30 steps of about 13 px: a steady drag, one pointer move per step.
    await page.mouse.move(cx + 200 * direction, cy + 100 * direction, { steps: 30 })
    await page.mouse.up()
    direction = -direction
  }
}

/** Wheels in and out around the middle of the canvas for `ms`. */
async function zoom(page: Page, box: { x: number, y: number, width: number, height: number }, ms: number): Promise<void> {
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2)
  const end = Date.now() + ms
  let k = 0
  while (Date.now() < end) {
    // Ten notches in, ten out: crosses the zoom at which terminal roles appear and disappear.
    await page.mouse.wheel(0, (Math.floor(k / 10) % 2 ? 1 : -1) * 60)
    await page.waitForTimeout(16)
    k++
  }
}

async function main() {
  const browser = await launchBenchBrowser()
  try {
    const context = await freshContext(browser)
    const page = await context.newPage()
    await signIn(page, base)
    const project = await benchProject(page, base)
    const networkId = await createNetwork(page, base, project.id, `Canvas benchmark ${Date.now()}`, chainDocument('Canvas benchmark', blockCount))
    try {
      await page.goto(`${base}/projects/${project.id}/networks/${networkId}`)
      await page.waitForSelector('[data-testid="results-fresh"]', { timeout: 120_000 })
      await waitInPage(page, `document.querySelectorAll('.vue-flow__node').length > 0`, 60_000)
      await page.waitForTimeout(1000)
      const box = (await page.locator('[data-testid="canvas"]').boundingBox())!
      const rendered = await page.evaluate(`document.querySelectorAll('.vue-flow__node').length`) as number

      // At the fitted view (every block on screen, zoomed far out) and zoomed in to 1:1 (a part of the chain on screen).
      const results: Record<string, ReturnType<typeof summary> & { nodesInDom: number, zoomAfter: number }> = {}
      for (const view of ['fitted', 'zoom 1'] as const) {
        if (view === 'zoom 1') {
          await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2)
          for (let k = 0; k < 40 && await viewScale(page) < 0.95; k++) {
            await page.mouse.wheel(0, -100)
            await page.waitForTimeout(50)
          }
          await page.waitForTimeout(800)
        }
        for (const gesture of ['pan', 'zoom'] as const) {
          const stop = await countFrames(page)
          if (gesture === 'pan') await pan(page, box, seconds * 1000)
          else await zoom(page, box, seconds * 1000)
          const frames = await stop()
          const nodesInDom = await page.evaluate(`document.querySelectorAll('.vue-flow__node').length`) as number
          results[`${gesture} (${view})`] = { ...summary(frames), nodesInDom, zoomAfter: +(await viewScale(page)).toFixed(2) }
          await page.waitForTimeout(300)
        }
      }
      console.log(`${blockCount} blocks (${rendered} nodes in the page after opening), ${seconds} s per gesture, headless Chromium without GPU`)
      for (const [name, r] of Object.entries(results)) {
        console.log(`${name.padEnd(16)} ${String(r.meanFps).padStart(5)} fps mean, slowest 5 % of frames ≥ ${r.p95FrameMs} ms (worst ${r.worstFrameMs} ms, ${r.frames} frames, ${r.nodesInDom} nodes in the page, zoom ${r.zoomAfter} after)`)
      }
      console.log(`load average: ${loadavg().map(l => l.toFixed(2)).join(' ')}`)
      console.log(JSON.stringify({ blocks: blockCount, seconds, results }))
    } finally {
      await deleteNetwork(page, base, project.id, networkId)
    }
  } finally {
    await browser.close()
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error)
  process.exit(1)
})

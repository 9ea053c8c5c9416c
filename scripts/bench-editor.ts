/**
 * Browser benchmark of the network editor: edits one parameter of a 40-block,
 * 1001-point network again and again, as a slider would, and reports the time
 * from the edit (an input event on the inspector field) to the redrawn plot,
 * measured inside the page. Not a test: it prints figures.
 *
 *   PORTWRIGHT_URL=http://127.0.0.1:3000 npx tsx scripts/bench-editor.ts [--edits 200]
 *
 * Needs a running app with the demo data (npm start).
 */
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { chromium } from 'playwright-core'

const base = (process.env.PORTWRIGHT_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '')
const editsArg = process.argv.indexOf('--edits')
const edits = editsArg > 0 ? Number(process.argv[editsArg + 1]) : 200

/** Two ports and 38 line sections in cascade, alternating impedances: 40 blocks, 1001 points. */
function benchDocument(name: string) {
  const blocks: Array<Record<string, unknown>> = [{ id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } }]
  const wires: Array<[string, string]> = []
  let previous = 'P1.1'
  for (let k = 1; k <= 38; k++) {
    blocks.push({ id: `TL${k}`, type: 'line', params: { impedance: k % 2 ? 'Za' : 'Zb', degrees: 90, at: 'f0' }, layout: { x: 120 * (k % 8), y: 120 * Math.floor(k / 8) } })
    wires.push([previous, `TL${k}.1`])
    previous = `TL${k}.2`
  }
  blocks.push({ id: 'P2', type: 'port', params: { index: 2 }, layout: { x: 0, y: 720 } })
  wires.push([previous, 'P2.1'])
  return {
    format: 'portwright.network', version: 1, name, referenceImpedance: 50,
    variables: { f0: '2 GHz', Za: '40 ohm', Zb: '62 ohm' },
    sweep: { start: '0.5 GHz', stop: '3.5 GHz', points: 1001, spacing: 'linear' },
    blocks, wires,
  }
}

function percentile(sorted: number[], p: number): number {
  const at = (sorted.length - 1) * p
  const lo = Math.floor(at)
  return sorted[lo]! + (sorted[Math.min(lo + 1, sorted.length - 1)]! - sorted[lo]!) * (at - lo)
}

async function main() {
  const profile = mkdtempSync(join(tmpdir(), 'portwright-bench-'))
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium', headless: true, viewport: { width: 1500, height: 950 },
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  })
  try {
    const page = context.pages()[0] ?? await context.newPage()
    const headers = { origin: base }
    const signin = await page.request.post(`${base}/api/auth/signin`, { data: { email: 'ines@quillmere.example', password: 'quillmere-demo-2026' }, headers })
    if (!signin.ok()) throw new Error(`sign-in failed: ${signin.status()}`)
    const projects = await (await page.request.get(`${base}/api/projects`)).json() as Array<{ id: string, name: string }>
    const project = projects.find(p => p.name === 'Beam-switch feed, S-band') ?? projects[0]
    if (!project) throw new Error('no project to work in')
    const created = await page.request.post(`${base}/api/projects/${project.id}/networks`, { data: { name: `Editor benchmark ${Date.now()}`, document: benchDocument('Editor benchmark') }, headers })
    if (!created.ok()) throw new Error(`could not create the benchmark network: ${created.status()} ${await created.text()}`)
    const network = await created.json() as { id: string }
    await page.goto(`${base}/projects/${project.id}/networks/${network.id}`)
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("1001 points")', { timeout: 60_000 })
    await page.click('[data-testid="block-TL1"]')
    await page.fill('[data-testid="param-impedance"]', '40')
    await page.waitForTimeout(500)

    // Passed as source text: the bundler's helper names must not leak into the page.
    const timings = await page.evaluate(`(async (count) => {
      const input = document.querySelector('[data-testid="param-impedance"]')
      const out = []
      const drawnAfter = (t0) => new Promise((resolve) => {
        const observer = new PerformanceObserver((list) => {
          const mark = list.getEntries().find(e => e.name === 'portwright:plot-drawn' && e.startTime >= t0)
          if (mark) { observer.disconnect(); resolve(mark.startTime) }
        })
        observer.observe({ type: 'mark' })
      })
      for (let k = 0; k < count; k++) {
        // A slider sweeping 35…65 Ω and back.
        const value = 35 + 30 * Math.abs(Math.sin(k / 15))
        const t0 = performance.now()
        const drawn = drawnAfter(t0)
        input.value = value.toFixed(3)
        input.dispatchEvent(new Event('input', { bubbles: true }))
        const t1 = await drawn
        const status = document.querySelector('[data-testid="results-fresh"]')?.textContent ?? ''
        out.push({ ms: t1 - t0, solveMs: Number(/([0-9.]+) ms/.exec(status)?.[1] ?? Number.NaN) })
        await new Promise(r => requestAnimationFrame(() => r(null)))
      }
      return out
    })(${edits})`) as Array<{ ms: number, solveMs: number }>

    const total = timings.map(t => t.ms).sort((a, b) => a - b)
    const solve = timings.map(t => t.solveMs).filter(Number.isFinite).sort((a, b) => a - b)
    console.log(JSON.stringify({
      blocks: 40, points: 1001, edits,
      editToPlotMs: { median: +percentile(total, 0.5).toFixed(2), p95: +percentile(total, 0.95).toFixed(2), max: +total.at(-1)!.toFixed(2) },
      workerSolveMs: { median: +percentile(solve, 0.5).toFixed(2), p95: +percentile(solve, 0.95).toFixed(2) },
    }))
    await page.request.delete(`${base}/api/projects/${project.id}/networks/${network.id}`, { headers })
  }
  finally {
    await context.close()
    rmSync(profile, { recursive: true, force: true })
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error)
  process.exit(1)
})

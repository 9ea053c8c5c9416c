/**
 * Browser benchmark of opening the editor: from the start of the navigation to
 * the first response plot drawn (the page's `portwright:plot-drawn` mark), for
 * a small network. Cold: a new browser context each time (empty cache, signed
 * in afresh). Warm: the same context visiting the editor again. Prints medians
 * (and the spread) over several runs. Not a test: it prints figures.
 *
 *   PORTWRIGHT_URL=http://127.0.0.1:3000 npx tsx scripts/bench-open.ts [--runs 5]
 *
 * Needs a running app with the demo data (npm start).
 */
import { loadavg } from 'node:os'
import type { Page } from 'playwright-core'
import { benchProject, createNetwork, deleteNetwork, freshContext, waitInPage, launchBenchBrowser, percentile, signIn } from './lib/bench-browser'

const base = (process.env.PORTWRIGHT_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '')
const runsArg = process.argv.indexOf('--runs')
const runs = runsArg > 0 ? Number(process.argv[runsArg + 1]) : 5

/** A quarter-wave transformer between two ports: three blocks, 201 points. */
function smallDocument(name: string) {
  return {
    format: 'portwright.network', version: 1, name, referenceImpedance: 50,
    variables: { f0: '2 GHz' },
    sweep: { start: '1 GHz', stop: '3 GHz', points: 201, spacing: 'linear' },
    blocks: [
      { id: 'P1', type: 'port', params: { index: 1 }, layout: { x: 0, y: 0 } },
      { id: 'TL1', type: 'line', params: { impedance: '70.7 ohm', degrees: 90, at: 'f0' }, layout: { x: 120, y: 0 } },
      { id: 'P2', type: 'port', params: { index: 2, impedance: '100 ohm' }, layout: { x: 280, y: 0 } },
    ],
    wires: [['P1.1', 'TL1.1'], ['TL1.2', 'P2.1']],
  }
}

interface Visit { firstPlotMs: number, responseEndMs: number, domContentLoadedMs: number, transferredKB: number }

/** Opens the editor in `page` and reads the navigation's timings once the first plot is drawn. */
async function visit(page: Page, url: string): Promise<Visit> {
  await page.goto(url, { waitUntil: 'commit' })
  await waitInPage(page, `performance.getEntriesByName('portwright:plot-drawn').length > 0`, 60_000)
  // Mark times are from the navigation's start (the page's time origin).
  return await page.evaluate(`(() => {
    const nav = performance.getEntriesByType('navigation')[0]
    const bytes = performance.getEntriesByType('resource').reduce((sum, r) => sum + (r.transferSize || 0), nav.transferSize || 0)
    return {
      firstPlotMs: performance.getEntriesByName('portwright:plot-drawn')[0].startTime,
      responseEndMs: nav.responseEnd,
      domContentLoadedMs: nav.domContentLoadedEventEnd,
      transferredKB: bytes / 1024,
    }
  })()`) as Visit
}

function medians(visits: Visit[]) {
  const at = (key: keyof Visit, p: number) => +percentile(visits.map(v => v[key]).sort((a, b) => a - b), p).toFixed(key === 'transferredKB' ? 0 : 1)
  return {
    firstPlotMs: { median: at('firstPlotMs', 0.5), min: at('firstPlotMs', 0), max: at('firstPlotMs', 1) },
    responseEndMs: at('responseEndMs', 0.5),
    domContentLoadedMs: at('domContentLoadedMs', 0.5),
    transferredKB: at('transferredKB', 0.5),
  }
}

async function main() {
  const browser = await launchBenchBrowser()
  const setup = await freshContext(browser)
  const setupPage = await setup.newPage()
  await signIn(setupPage, base)
  const project = await benchProject(setupPage, base)
  const networkId = await createNetwork(setupPage, base, project.id, `Open benchmark ${Date.now()}`, smallDocument('Open benchmark'))
  const url = `${base}/projects/${project.id}/networks/${networkId}`
  const cold: Visit[] = []
  const warm: Visit[] = []
  try {
    // One visit first that neither list counts: the server's own first request of the route is not what either case measures.
    await visit(setupPage, url)
    for (let k = 0; k < runs; k++) {
      const context = await freshContext(browser)
      try {
        const page = await context.newPage()
        await signIn(page, base)
        cold.push(await visit(page, url))
        // Leave the editor before coming back, as a person would (the live connection closes).
        await page.goto('about:blank')
        warm.push(await visit(page, url))
      } finally {
        await context.close()
      }
    }
    const result = { runs, cold: medians(cold), warm: medians(warm), loadAverage: loadavg().map(l => +l.toFixed(2)) }
    console.log(`editor open → first plot, small network (3 blocks, 201 points), ${runs} runs, loopback, headless Chromium without GPU`)
    for (const name of ['cold', 'warm'] as const) {
      const r = result[name]
      console.log(`${name}: median ${r.firstPlotMs.median} ms (min ${r.firstPlotMs.min}, max ${r.firstPlotMs.max}); HTML in ${r.responseEndMs} ms, DOMContentLoaded ${r.domContentLoadedMs} ms, ${r.transferredKB} KB transferred`)
    }
    console.log(`load average: ${result.loadAverage.join(' ')}`)
    console.log(JSON.stringify(result))
  } finally {
    await deleteNetwork(setupPage, base, project.id, networkId)
    await browser.close()
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error)
  process.exit(1)
})

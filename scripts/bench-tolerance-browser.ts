/**
 * Browser benchmark of a yield run in the editor's Web Workers: 1000 Monte Carlo trials of the branch-line
 * quadrature hybrid (`branch-line-tolerances`, 201 sweep points), keeping |S21| so that every trial is solved at
 * all 201 points. Times, inside the page, the click on Run to the answer on screen, and splits it at the first
 * progress the workers report (start-up: workers loaded and the document prepared) and the rest (the trials and
 * the joining). Not a test: it prints figures.
 *
 *   PORTWRIGHT_URL=http://127.0.0.1:3000 npx tsx scripts/bench-tolerance-browser.ts [--trials 1000] [--repeat 5]
 *
 * Needs a running app with the demo data (npm start).
 */
import { mkdtempSync, rmSync } from 'node:fs'
import { loadavg, tmpdir } from 'node:os'
import { join } from 'node:path'
import { chromium } from 'playwright-core'
import { branchLineTuning } from '../shared/examples/index'

const base = (process.env.PORTWRIGHT_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '')
const option = (name: string, fallback: number) => {
  const at = process.argv.indexOf(`--${name}`)
  const value = at > 0 ? Number(process.argv[at + 1]) : fallback
  if (!Number.isInteger(value) || value < 1) throw new Error(`--${name} must be a whole number from 1`)
  return value
}
const trials = option('trials', 1000)
const repeat = option('repeat', 5)

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b)
  return s.length % 2 ? s[(s.length - 1) / 2]! : (s[s.length / 2 - 1]! + s[s.length / 2]!) / 2
}

async function main() {
  const profile = mkdtempSync(join(tmpdir(), 'portwright-bench-'))
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium', headless: true, viewport: { width: 1500, height: 950 },
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  })
  const headers = { origin: base }
  const page = context.pages()[0] ?? await context.newPage()
  let cleanup = async () => {}
  try {
    const signin = await page.request.post(`${base}/api/auth/signin`, { data: { email: 'ines@quillmere.example', password: 'quillmere-demo-2026' }, headers })
    if (!signin.ok()) throw new Error(`sign-in failed: ${signin.status()}`)
    const projects = await (await page.request.get(`${base}/api/projects`)).json() as Array<{ id: string, name: string, role: string }>
    const project = projects.find(p => p.role === 'owner' || p.role === 'editor')
    if (!project) throw new Error('no project where the demo engineer may create a network')
    const created = await page.request.post(`${base}/api/projects/${project.id}/networks`, { data: { name: `Tolerance benchmark ${Date.now()}`, document: branchLineTuning(false) }, headers })
    if (!created.ok()) throw new Error(`could not create the benchmark network: ${created.status()} ${await created.text()}`)
    const network = await created.json() as { id: string }
    cleanup = async () => { await page.request.delete(`${base}/api/projects/${project.id}/networks/${network.id}`, { headers }) }

    await page.goto(`${base}/projects/${project.id}/networks/${network.id}`)
    await page.waitForSelector('[data-testid="results-fresh"]', { timeout: 60_000 })
    await page.click('[data-testid="open-tuning"]')
    await page.fill('[data-testid="yield-trials"]', String(trials))
    await page.fill('[data-testid="yield-seed"]', '1')
    await page.fill('[data-testid="yield-trace"]', 'S21')
    const workers = await page.evaluate('Math.min(navigator.hardwareConcurrency || 2, 8)') as number

    const runs: Array<{ totalMs: number, startupMs: number, text: string }> = []
    let firstMs = 0
    // One run first, reported apart (firstRunMs): the page compiles the solver's code on its first use.
    for (let k = 0; k <= repeat; k++) {
      // Passed as source text: the bundler's helper names must not leak into the page.
      const run = await page.evaluate(`(async () => {
        const old = document.querySelector('[data-testid="yield-result"]')
        if (old) old.setAttribute('data-bench-old', '')
        let firstProgress = null
        const t0 = performance.now()
        const finished = new Promise((resolve) => {
          const look = () => {
            const bar = document.querySelector('[data-testid="yield-progress"] progress')
            if (firstProgress === null && bar && Number(bar.value) > 0) firstProgress = performance.now()
            const result = document.querySelector('[data-testid="yield-result"]:not([data-bench-old])')
            if (result) { observer.disconnect(); resolve(result.textContent || '') }
          }
          const observer = new MutationObserver(look)
          observer.observe(document.body, { subtree: true, childList: true, attributes: true, characterData: true })
        })
        document.querySelector('[data-testid="yield-run"]').click()
        const text = await finished
        const t1 = performance.now()
        return { totalMs: t1 - t0, startupMs: (firstProgress ?? t1) - t0, text }
      })()`) as { totalMs: number, startupMs: number, text: string }
      if (k > 0) runs.push(run)
      else firstMs = run.totalMs
    }
    const answer = /(\d+) of (\d+), seed/.exec(runs[0]!.text)
    console.log(JSON.stringify({
      trials, points: 201, workers, repeat,
      totalMs: { median: +median(runs.map(r => r.totalMs)).toFixed(1), min: +Math.min(...runs.map(r => r.totalMs)).toFixed(1), max: +Math.max(...runs.map(r => r.totalMs)).toFixed(1) },
      startupMs: { median: +median(runs.map(r => r.startupMs)).toFixed(1) },
      firstRunMs: +firstMs.toFixed(1),
      passed: answer ? Number(answer[1]) : null,
      loadAverage: loadavg().map(x => +x.toFixed(2)),
      date: new Date().toISOString(),
    }))
  }
  finally {
    await cleanup().catch(() => {})
    await context.close()
    rmSync(profile, { recursive: true, force: true })
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error)
  process.exit(1)
})

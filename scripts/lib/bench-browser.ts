import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core'

/** Demo account the browser benchmarks sign in as (seeded only for a loopback app). */
export const BENCH_ACCOUNT = { email: 'ines@quillmere.example', password: 'quillmere-demo-2026' }

/** Headless Chromium as the benchmarks run it: no GPU (software compositing), nothing in the background. */
export async function launchBenchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.PORTWRIGHT_CHROMIUM ?? '/usr/bin/chromium', headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  })
}

/** A fresh browser context (empty cache, no cookies) with a large viewport. */
export async function freshContext(browser: Browser): Promise<BrowserContext> {
  return browser.newContext({ viewport: { width: 1500, height: 950 } })
}

/** Signs the page's context in (the session cookie lands in the context). */
export async function signIn(page: Page, base: string): Promise<void> {
  const response = await page.request.post(`${base}/api/auth/signin`, { data: BENCH_ACCOUNT, headers: { origin: base } })
  if (!response.ok()) throw new Error(`sign-in failed: ${response.status()}`)
}

/** The demo project the benchmarks create their networks in. */
export async function benchProject(page: Page, base: string): Promise<{ id: string, name: string }> {
  const projects = await (await page.request.get(`${base}/api/projects`)).json() as Array<{ id: string, name: string }>
  const project = projects.find(p => p.name === 'Beam-switch feed, S-band') ?? projects[0]
  if (!project) throw new Error('no project to work in')
  return project
}

/** Creates a network from a document through the API; returns its id. */
export async function createNetwork(page: Page, base: string, projectId: string, name: string, document: unknown): Promise<string> {
  const created = await page.request.post(`${base}/api/projects/${projectId}/networks`, { data: { name, document }, headers: { origin: base } })
  if (!created.ok()) throw new Error(`could not create the benchmark network: ${created.status()} ${await created.text()}`)
  return (await created.json() as { id: string }).id
}

/** Deletes a benchmark network again. */
export async function deleteNetwork(page: Page, base: string, projectId: string, networkId: string): Promise<void> {
  await page.request.delete(`${base}/api/projects/${projectId}/networks/${networkId}`, { headers: { origin: base } })
}

/**
 * Polls an expression in the page every 10 ms until it is true. (Playwright's
 * waitForFunction evaluates its predicate with eval, which the app's content
 * security policy forbids; page.evaluate does not.)
 */
export async function waitInPage(page: Page, expression: string, timeoutMs: number): Promise<void> {
  const end = Date.now() + timeoutMs
  while (!(await page.evaluate(expression))) {
    if (Date.now() > end) throw new Error(`timed out after ${timeoutMs} ms waiting for ${expression}`)
    await new Promise(r => setTimeout(r, 10))
  }
}

/** Interpolated percentile of an ascending list, p in 0…1. */
export function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return Number.NaN
  const at = (sorted.length - 1) * p
  const lo = Math.floor(at)
  return sorted[lo]! + (sorted[Math.min(lo + 1, sorted.length - 1)]! - sorted[lo]!) * (at - lo)
}

import { mkdtempSync, mkdirSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { chromium, type BrowserContext, type Page } from 'playwright-core'
import { appUrl } from './app'

/** Where browser tests leave screenshots. */
export const screenshotDir = join(process.cwd(), 'test-results', 'screenshots')

/** Debian's Chromium, headless, with a fresh profile and no background network traffic. */
export async function launchBrowser(): Promise<{ context: BrowserContext; page: Page; close: () => Promise<void> }> {
  mkdirSync(screenshotDir, { recursive: true })
  const profile = mkdtempSync(join(tmpdir(), 'portwright-browser-'))
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1440, height: 900 },
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  })
  const page = context.pages()[0] ?? await context.newPage()
  // Every page a browser test opens must work under the app's content security policy: a violation fails the test.
  const violations: string[] = []
  const watch = (p: Page) => p.on('console', (message) => {
    if (/Content Security Policy/i.test(message.text())) violations.push(message.text())
  })
  watch(page)
  context.on('page', watch)
  return {
    context,
    page,
    close: async () => {
      await context.close()
      rmSync(profile, { recursive: true, force: true })
      if (violations.length) throw new Error(`content security policy violations:\n${violations.join('\n')}`)
    },
  }
}

/** Signs in through the sign-in page and waits for the projects list. */
export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto(appUrl('/signin'))
  await page.getByTestId('signin-email').fill(email)
  await page.getByTestId('signin-password').fill(password)
  await page.getByTestId('signin-submit').click()
  await page.waitForURL(url => !url.pathname.startsWith('/signin'))
}

/** Saves a full-page screenshot under test-results/screenshots. */
export async function screenshot(page: Page, name: string): Promise<string> {
  const path = join(screenshotDir, `${name}.png`)
  await page.screenshot({ path, fullPage: true })
  return path
}

/** A browser signed in as one person, at the given window size (the launch default otherwise). */
export async function signedInBrowser(email: string, password: string, viewport?: { width: number; height: number }): Promise<{ context: BrowserContext; page: Page; close: () => Promise<void> }> {
  const browser = await launchBrowser()
  if (viewport) await browser.page.setViewportSize(viewport)
  await signIn(browser.page, email, password)
  return browser
}

/** On a project's page: creates an empty network of that name and waits for its editor. */
export async function createNetworkHere(page: Page, name: string): Promise<void> {
  await page.click('[data-testid="new-network"]')
  await page.fill('[data-testid="network-name"]', name)
  await page.click('[data-testid="network-create"]')
  await page.waitForURL(/\/networks\//)
}

/** From the projects list: opens the project of that name and creates an empty network in it. */
export async function createNetworkInProject(page: Page, project: string, name: string): Promise<void> {
  await page.goto(appUrl('/'))
  await page.click(`text=${project}`)
  await createNetworkHere(page, name)
}

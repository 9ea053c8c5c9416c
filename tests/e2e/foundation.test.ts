import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { launchBrowser, screenshot, signIn } from '../support/browser'
import { appUrl } from '../support/app'

type Browser = Awaited<ReturnType<typeof launchBrowser>>
let browser: Browser

beforeAll(async () => { browser = await launchBrowser() })
afterAll(async () => { await browser?.close() })

describe('foundation in a real browser', () => {
  it('sends a signed-out visitor to sign-in, and shows the safety note', async () => {
    const { page } = browser
    await page.goto(appUrl('/'))
    await page.waitForURL(/\/signin/)
    await expect(page.getByTestId('safety-note').textContent()).resolves.toMatch(/verify with measurement/)
    await screenshot(page, 'foundation-signin')
  })

  it('shows a wrong password next to the form', async () => {
    const { page } = browser
    await page.goto(appUrl('/signin'))
    await page.getByTestId('signin-email').fill('jun@quillmere.example')
    await page.getByTestId('signin-password').fill('not-the-password')
    await page.getByTestId('signin-submit').click()
    await expect(page.getByTestId('signin-error').textContent()).resolves.toMatch(/E-mail or password is wrong/)
  })

  it('signs in as a demo user, opens the project and a network', async () => {
    const { page } = browser
    await signIn(page, 'ines@quillmere.example', 'quillmere-demo-2026')
    await page.getByText('Beam-switch feed, S-band').click()
    await page.getByTestId('project-title').waitFor()
    expect(await page.getByTestId('member-list').textContent()).toContain('Priya Castellane')
    await screenshot(page, 'foundation-project')
    await page.getByTestId('network-list').getByText('Quadrature split, 2.45 GHz (branch-line from lines)').click()
    await page.waitForURL(/\/networks\//)
    await page.getByText('THRU_A').first().waitFor({ timeout: 30_000 })
    await screenshot(page, 'foundation-network')
  })
})

import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { launchBrowser, screenshot, signIn } from '../support/browser'
import { appUrl } from '../support/app'
import { newSignedInUser, TEST_PASSWORD } from '../support/http'
import { mailDuring, resetToken } from '../support/mail'

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

  it('"Forgot your password?" asks for the address, mails a link, and the link sets a new password', async () => {
    const { page } = browser
    const { email } = await newSignedInUser('Forgetful Engineer')
    await page.goto(appUrl('/signin'))
    await page.getByTestId('forgot-password').click()
    await page.waitForURL(/\/password-reset$/)
    await page.getByTestId('reset-email').fill(email)
    const mail = await mailDuring([email], async () => {
      await page.getByTestId('reset-submit').click()
      await page.getByTestId('reset-requested').waitFor()
    }, 1)
    expect(await page.getByTestId('reset-requested').textContent()).toMatch(/If an account uses this address/)
    await screenshot(page, 'foundation-reset-requested')
    await page.goto(appUrl(`/password-reset/${resetToken(mail[0]!)}`))
    await page.getByTestId('reset-password').fill('remembered-at-last-2026')
    await page.getByTestId('reset-confirm').click()
    expect(await page.getByTestId('reset-done').textContent()).toContain(email)
    await signIn(page, email, 'remembered-at-last-2026')
    expect(new URL(page.url()).pathname).toBe('/')
  })

  it('the account page lists this browser\'s session and changes the password', async () => {
    const { page } = browser
    const { email } = await newSignedInUser('Account Keeper')
    await signIn(page, email, TEST_PASSWORD)
    await page.goto(appUrl('/account'))
    await page.getByTestId('account-session-current').waitFor()
    expect(await page.getByTestId('account-session').count()).toBeGreaterThanOrEqual(2)
    await page.getByTestId('password-current').fill(TEST_PASSWORD)
    await page.getByTestId('password-new').fill('a-fresh-password-2026')
    await page.getByTestId('password-change-submit').click()
    expect(await page.getByTestId('password-changed').textContent()).toMatch(/Password changed\. 1 other browser was signed out/)
    await expect.poll(() => page.getByTestId('account-session').count()).toBe(1)
    await screenshot(page, 'foundation-account')
  })
})

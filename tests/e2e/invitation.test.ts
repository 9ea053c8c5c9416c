import { randomUUID } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { launchBrowser, screenshot, signIn } from '../support/browser'
import { newSignedInUser, signedIn, TEST_PASSWORD } from '../support/http'
import { invitationToken, mailDuring } from '../support/mail'
import { appUrl } from '../support/app'

type Browser = Awaited<ReturnType<typeof launchBrowser>>
let browser: Browser
let link = ''
let projectId = ''
const email = `newcomer-${randomUUID().slice(0, 8)}@test.example`

beforeAll(async () => {
  browser = await launchBrowser()
  const owner = await signedIn('ines@quillmere.example', 'quillmere-demo-2026')
  const projects = await owner.get('/api/projects')
  projectId = projects.body.find((p: { name: string }) => p.name === 'Beam-switch feed, S-band').id
  const mail = await mailDuring([email], () => owner.post(`/api/projects/${projectId}/invitations`, { email, role: 'reviewer' }))
  link = `/invitations/${invitationToken(mail[0]!)}`
})
afterAll(async () => { await browser?.close() })

describe('invitation in a real browser', () => {
  it('someone without an account opens the link, signs up and lands in the project as reviewer', async () => {
    const { page } = browser
    await page.goto(appUrl(link))
    await page.getByTestId('invitation-page').getByText('as reviewer').first().waitFor()
    // A new account is made for the invited address itself; there is no address to type.
    expect(await page.getByTestId('invitation-signup-address').textContent()).toContain(email)
    await page.getByTestId('invitation-name').fill('Nell Newcomer')
    await page.getByTestId('invitation-password').fill('newcomer-password-2026')
    await screenshot(page, 'invitation-1-open')
    await page.getByTestId('invitation-accept').click()
    await page.waitForURL(new RegExp(`/projects/${projectId}$`))
    await page.getByTestId('project-title').waitFor()
    expect(await page.getByTestId('member-list').textContent()).toContain('Nell Newcomer')
  })

  it('someone signed in with another account is told the invitation is not theirs and can switch accounts', async () => {
    const owner = await signedIn('ines@quillmere.example', 'quillmere-demo-2026')
    const invited = `invited-${randomUUID().slice(0, 8)}@test.example`
    const mail = await mailDuring([invited], () => owner.post(`/api/projects/${projectId}/invitations`, { email: invited, role: 'viewer' }))
    const other = await newSignedInUser('Other Account')
    const { page } = browser
    await signIn(page, other.email, TEST_PASSWORD)
    await page.goto(appUrl(`/invitations/${invitationToken(mail[0]!)}`))
    expect(await page.getByTestId('invitation-other-account').textContent()).toMatch(/only the account with that address can join/)
    expect(await page.getByTestId('invitation-accept').count()).toBe(0)
    await screenshot(page, 'invitation-3-other-account')
    await page.getByTestId('invitation-switch-account').click()
    await page.getByTestId('invitation-have-account').waitFor()
    expect(await page.getByTestId('invitation-email').inputValue()).toBe(invited)
  })

  it('the same link a second time is refused and says why', async () => {
    const { page } = browser
    await page.goto(appUrl(link))
    expect(await page.getByTestId('invitation-refused').textContent()).toMatch(/already been used/)
    await screenshot(page, 'invitation-2-used')
  })
})

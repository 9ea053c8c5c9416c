import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { launchBrowser, screenshot, signIn } from '../support/browser'
import { appUrl } from '../support/app'

type Browser = Awaited<ReturnType<typeof launchBrowser>>
let browser: Browser

beforeAll(async () => { browser = await launchBrowser() })
afterAll(async () => { await browser?.close() })

const tokenSelf = (token: string) => fetch(appUrl('/api/v1/token'), { headers: { authorization: `Bearer ${token}` } })

describe('access tokens on the account page', () => {
  it('creates a token shown once, which a script can use until it is revoked', async () => {
    const { page } = browser
    await signIn(page, 'jun@quillmere.example', 'quillmere-demo-2026')
    await page.goto(appUrl('/account'))
    const name = `Nightly sweep ${Date.now()}`
    await page.getByTestId('token-name').fill(name)
    await page.getByTestId('token-form').getByText('Beam-switch feed, S-band').click()
    await page.getByTestId('token-form').getByRole('button', { name: 'Create token' }).click()
    const secret = await page.getByTestId('token-secret').inputValue()
    expect(secret).toMatch(/^pwt_[A-Za-z0-9_-]{43}$/)
    await screenshot(page, 'account-token-created')
    const used = await tokenSelf(secret)
    expect(used.status).toBe(200)
    expect((await used.json()).projects).toEqual([expect.objectContaining({ name: 'Beam-switch feed, S-band', role: 'viewer' })])

    await page.reload()
    await page.getByTestId('token-list').getByText(name).waitFor()
    expect(await page.getByTestId('token-created').count()).toBe(0)
    expect(await page.content()).not.toContain(secret)
    await page.getByRole('button', { name: `Revoke ${name}` }).click()
    await page.getByTestId('token-list').getByText(name).waitFor({ state: 'detached' })
    expect((await tokenSelf(secret)).status).toBe(401)
  })
})

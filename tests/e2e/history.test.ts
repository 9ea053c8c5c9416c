import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { branchLineHybrid } from '../../shared/examples/index'
import type { NetworkDocument } from '../../shared/network/types'
import { launchBrowser, screenshot, signIn } from '../support/browser'
import { appUrl } from '../support/app'
import { TEST_PASSWORD, newSignedInUser } from '../support/http'

type Browser = Awaited<ReturnType<typeof launchBrowser>>
let browser: Browser
let person: Awaited<ReturnType<typeof newSignedInUser>>
let base: string
let networkId: string
let projectId: string

async function saveImpedance(value: number) {
  const current = (await person.client.get(`${base}/networks/${networkId}`)).body
  const document = structuredClone(current.document) as NetworkDocument
  document.blocks.find(b => b.id === 'T12')!.params.impedance = value
  const saved = await person.client.put(`${base}/networks/${networkId}`, { revision: current.revision, document })
  expect(saved.status, JSON.stringify(saved.body)).toBe(200)
  return saved.body.revision as number
}

beforeAll(async () => {
  person = await newSignedInUser('Hester Browser')
  projectId = (await person.client.post('/api/projects', { name: 'History in the browser' })).body.id
  base = `/api/projects/${projectId}`
  networkId = (await person.client.post(`${base}/networks`, { name: 'Hybrid with a past', document: branchLineHybrid })).body.id
  browser = await launchBrowser()
})
afterAll(async () => {
  await browser?.close()
})

describe('history in a real browser', () => {
  it('an editor opens History from the editor, compares an older checkpoint with the live network and restores it', async () => {
    const older = await saveImpedance(36)
    const latest = await saveImpedance(44)
    const list = (await person.client.get(`${base}/networks/${networkId}/checkpoints`)).body as Array<{ id: string; revision: number }>
    const target = list.find(c => c.revision === older)!

    const { page } = browser
    await signIn(page, person.email, TEST_PASSWORD)
    await page.goto(appUrl(`/projects/${projectId}/networks/${networkId}`))
    await page.getByTestId('open-history').click()
    await page.getByTestId('history-title').getByText('History of Hybrid with a past').waitFor()
    await page.getByTestId(`checkpoint-${target.id}`).click()
    await page.getByTestId('checkpoint-heading').waitFor()
    // Restoring would change T12's impedance from the live 44 back to 36.
    const row = page.getByTestId('diff-row-T12.impedance')
    await row.waitFor()
    expect(await row.innerText()).toMatch(/44[\s\S]*36/)
    await screenshot(page, 'history-1-compare')

    await page.getByTestId('checkpoint-restore').click()
    await page.getByTestId('checkpoint-restore-confirm').click()
    await page.getByTestId('history-outcome').getByText(`Restored as revision ${latest + 1}`).waitFor()
    // The page moves to the newest checkpoint, the restored version, which is now the live network.
    await page.getByTestId('checkpoint-same').waitFor()
    await page.getByText(`live at revision ${latest + 1}`).waitFor()
    await screenshot(page, 'history-2-restored')

    const now = (await person.client.get(`${base}/networks/${networkId}`)).body
    expect(now.revision).toBe(latest + 1)
    expect(now.document.blocks.find((b: { id: string }) => b.id === 'T12').params.impedance).toBe(36)
    const after = (await person.client.get(`${base}/networks/${networkId}/checkpoints`)).body
    expect(after[0]).toMatchObject({ reason: 'checkpoint-restore', revision: latest + 1 })
    // The list on the page follows: the new checkpoint is there and is the same as the live network.
    await page.getByTestId(`checkpoint-${after[0].id}`).click()
    await page.getByTestId('checkpoint-same').waitFor()
  })
})

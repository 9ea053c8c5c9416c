import { execFileSync } from 'node:child_process'
import { mkdirSync, readdirSync, readFileSync, rmSync } from 'node:fs'
import { join } from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { launchBrowser, signIn } from '../support/browser'
import { appUrl } from '../support/app'
import { SAFETY_NOTE } from '../../shared/solver/safety-note'
import { readTouchstone } from '../../shared/touchstone/read'

type Browser = Awaited<ReturnType<typeof launchBrowser>>
let browser: Browser
const NETWORK = 'Quadrature split, 2.45 GHz (branch-line from lines)'
/** Where the printed PDFs and their page images go, to be looked at. */
const outDir = join(process.cwd(), 'test-results', 'report')
let reportUrl = ''

beforeAll(async () => {
  rmSync(outDir, { recursive: true, force: true })
  mkdirSync(outDir, { recursive: true })
  browser = await launchBrowser()
  await signIn(browser.page, 'tomas@quillmere.example', 'quillmere-demo-2026')
})
afterAll(async () => { await browser?.close() })

/** Text of a PDF, lines joined by spaces (poppler's pdftotext). */
function pdfText(file: string): string {
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ')
}
/** Page count from poppler's pdfinfo. */
function pdfPages(file: string): number {
  const info = execFileSync('pdfinfo', [file], { encoding: 'utf8' })
  return Number(/^Pages:\s+(\d+)/m.exec(info)?.[1])
}

describe('exports and the printable report of the demo branch-line network', () => {
  it('the results dock exports Touchstone that carries the caution and reads back', async () => {
    const { page } = browser
    await page.goto(appUrl('/'))
    await page.getByText('Beam-switch feed, S-band').click()
    await page.getByText(NETWORK).first().click()
    await page.waitForURL(/\/networks\//)
    await page.waitForSelector('[data-testid="results-fresh"]:has-text("4-port")', { timeout: 30_000 })
    await page.getByTestId('export-open').click()
    await page.getByTestId('export-ts-version').selectOption('2.0')
    await page.getByTestId('export-ts-format').selectOption('DB')
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-touchstone').click()])
    expect(download.suggestedFilename()).toMatch(/\.s4p$/)
    const text = readFileSync((await download.path())!, 'utf8')
    expect(text).toContain(`! ${SAFETY_NOTE}`)
    expect(text).toContain('[Version] 2.0')
    const back = readTouchstone(text, { ports: 4 })
    expect(back.ports).toBe(4)
    expect(back.frequencies.length).toBeGreaterThan(10)
    const [csv] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-csv').click()])
    expect(readFileSync((await csv.path())!, 'utf8').split('\r\n')[1]).toBe('Frequency (Hz),S11 (dB),S21 (dB),S31 (dB),S41 (dB)')
    const [png] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-png').click()])
    // PNG signature (ISO/IEC 15948, §5.2): 89 50 4E 47 0D 0A 1A 0A.
    expect(readFileSync((await png.path())!).subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a')
    const [svg] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-svg').click()])
    const svgText = readFileSync((await svg.path())!, 'utf8')
    expect(svgText.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true)
    expect(svgText.match(/<path /g)).toHaveLength(4)
    expect(svgText).toContain(SAFETY_NOTE)
    await page.getByTestId('export-open').click()
    await page.getByTestId('open-report').click()
    await page.waitForURL(/\/report\//)
    reportUrl = page.url()
  })

  it('a snapshot has a report of its own, reached from the snapshot bar, with the frozen summary', async () => {
    const { page } = browser
    const [, projectId, networkId] = /\/projects\/([^/]+)\/report\/([^/?]+)/.exec(reportUrl)!
    const title = `Report check ${Date.now().toString(36)}`
    const created = await page.evaluate(async ({ path, title }) => {
      const response = await fetch(path, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ title }) })
      return response.json() as Promise<{ id: string }>
    }, { path: `/api/projects/${projectId}/networks/${networkId}/snapshots`, title })
    await page.goto(appUrl(`/projects/${projectId}/snapshots/${networkId}/${created.id}`))
    await page.getByTestId('snapshot-heading').getByText(title).waitFor()
    await page.getByTestId('open-report').click()
    await page.waitForURL(new RegExp(`/report/${networkId}\\?snapshot=${created.id}$`))
    await page.getByTestId('report-balance').locator('svg').waitFor({ timeout: 30_000 })
    expect(await page.getByTestId('report-edition').textContent()).toMatch(new RegExp(`^Snapshot “${title}” of revision \\d+$`))
    expect(await page.getByTestId('report-figures').textContent()).toContain('S21 −3.01 dB')
    const file = join(outDir, 'report-snapshot-A4.pdf')
    await page.pdf({ path: file, format: 'A4', printBackground: true })
    expect(pdfText(file)).toContain(title)
    execFileSync('pdftoppm', ['-png', '-r', '70', file, join(outDir, 'report-snapshot-A4')])
  })

  for (const format of ['A4', 'Letter'] as const) {
    it(`prints the report to a ${format} PDF with the title, the plots and the caution`, async () => {
      const { page } = browser
      await page.goto(reportUrl)
      await page.getByTestId('report-balance').locator('svg').waitFor({ timeout: 30_000 })
      await page.getByTestId('report-title').getByText(NETWORK).waitFor()
      const file = join(outDir, `report-${format}.pdf`)
      await page.pdf({ path: file, format, printBackground: true })
      const pages = pdfPages(file)
      // Header, schematic, figures, two plots, tables and cautions: three or four pages (five at most on Letter).
      expect(pages).toBeGreaterThanOrEqual(2)
      expect(pages).toBeLessThanOrEqual(5)
      const text = pdfText(file)
      expect(text).toMatch(/network report/i)
      expect(text).toContain(NETWORK)
      expect(text).toContain('Beam-switch feed, S-band')
      expect(text).toContain('Simulated results: verify hardware by measurement.')
      expect(text).toContain('defer to them and to licensed practice')
      expect(text).toContain('Key figures at the centre')
      expect(text).not.toContain('Print or save as PDF')
      execFileSync('pdftoppm', ['-png', '-r', '70', file, join(outDir, `report-${format}`)])
      const images = readdirSync(outDir).filter(f => f.startsWith(`report-${format}-`) && f.endsWith('.png'))
      expect(images).toHaveLength(pages)
    })
  }
})

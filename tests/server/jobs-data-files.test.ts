import { spawn, type ChildProcess } from 'node:child_process'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { JobDto } from '../../shared/types/jobs'
import { bringTemplateFiles, type ProjectFilesAccess } from '../../app/utils/templates/templateFiles'
import { findTemplate, templateDataResolver } from '../../shared/templates/index'
import { INVENTED_AMPLIFIER_FILE } from '../../shared/templates/invented-amplifier'
import { prepareTuning, resolveTolerances, runTrials } from '../../shared/tuning/index'
import { fileForm, newSignedInUser } from '../support/http'

/**
 * Networks that use project data files: the balanced-amplifier template brings its amplifier file into a project
 * through the file routes, and such a network (directly, and inside a subnetwork) runs on the server's queue with
 * the worker reading the project's files, giving the yield a local run gives for the same seed.
 */
type Person = Awaited<ReturnType<typeof newSignedInUser>>
let owner: Person
let base: string
const template = findTemplate('balanced-amplifier')!
let worker: { child: ChildProcess; output: () => string } | undefined

async function until(check: () => boolean | Promise<boolean>, timeoutMs: number, what: () => string, everyMs = 250): Promise<void> {
  const end = Date.now() + timeoutMs
  while (!(await check())) {
    if (Date.now() > end) throw new Error(what())
    await new Promise(r => setTimeout(r, everyMs))
  }
}

/** The project's file routes as the gallery uses them, here through the test's signed-in client. */
function filesOf(person: Person, projectBase: string): ProjectFilesAccess {
  return {
    list: async () => (await person.client.get(`${projectBase}/files`)).body,
    read: async id => (await person.client.get(`${projectBase}/files/${id}`)).body as string,
    async upload(name, text) {
      const made = await person.client.request('POST', `${projectBase}/files`, fileForm(name, text))
      if (made.status !== 201) throw new Error(`upload ${name}: ${made.status} ${JSON.stringify(made.body)}`)
    },
  }
}

async function runToEnd(networkId: string, body: Record<string, unknown>): Promise<JobDto> {
  const sent = await owner.client.post(`${base}/networks/${networkId}/jobs`, body)
  expect(sent.status, JSON.stringify(sent.body)).toBe(201)
  let last: JobDto = sent.body
  await until(async () => {
    last = (await owner.client.get(`${base}/networks/${networkId}/jobs/${sent.body.id}`)).body
    return last.state === 'done' || last.state === 'failed'
  }, 180_000, () => `the run did not finish: ${JSON.stringify(last)}\n${worker?.output()}`, 500)
  return last
}

beforeAll(async () => {
  owner = await newSignedInUser('Dana Datafile')
  const project = await owner.client.post('/api/projects', { name: 'Balanced pair on the queue' })
  base = `/api/projects/${project.body.id}`
  const child = spawn('npm', ['run', '-s', 'worker'], {
    cwd: process.cwd(),
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: { ...process.env, NUXT_DATABASE_URL: process.env.PORTWRIGHT_TEST_DATABASE_URL!, PORTWRIGHT_JOB_MAINTENANCE_SECONDS: '2' },
  })
  let text = ''
  child.stdout!.on('data', (d) => { text += d })
  child.stderr!.on('data', (d) => { text += d })
  worker = { child, output: () => text }
  await until(() => text.includes('taking tolerance and optimisation runs'), 60_000, () => `worker did not start:\n${text}`)
}, 120_000)

afterAll(() => {
  try { process.kill(-worker!.child.pid!, 'SIGTERM') } catch { /* already gone */ }
})

describe('a template that needs a data file, through the project routes', () => {
  let networkId = ''

  it('uploads the amplifier file once, and a second network from the template reuses it', async () => {
    const files = filesOf(owner, base)
    const first = await bringTemplateFiles(template.build(), template.files!, files)
    expect(first.placements).toEqual([{ templateName: INVENTED_AMPLIFIER_FILE, name: INVENTED_AMPLIFIER_FILE, uploaded: true }])
    const made = await owner.client.post(`${base}/networks`, { name: first.document.name, document: first.document })
    expect(made.status, JSON.stringify(made.body)).toBe(201)
    networkId = made.body.id
    const second = await bringTemplateFiles(template.build(), template.files!, files)
    expect(second.placements[0]!.uploaded).toBe(false)
    const listed = (await owner.client.get(`${base}/files`)).body as Array<{ name: string; summary: { ports: number } }>
    expect(listed.map(f => f.name)).toEqual([INVENTED_AMPLIFIER_FILE])
    expect(listed[0]!.summary.ports).toBe(2)
  })

  it('a tolerance run of it on the queue equals the same trials run here (worker reads the project file)', async () => {
    const trials = 1500, seed = 11
    const prepared = prepareTuning(template.build(), { resolveData: templateDataResolver(template) })
    if (!prepared.ok) throw new Error(prepared.problems.map(p => p.message).join('\n'))
    const spreads = resolveTolerances(prepared.setup)
    if (!spreads.ok) throw new Error('tolerances')
    const local = runTrials(prepared.setup, spreads.spreads, { seed, to: trials })
    const done = await runToEnd(networkId, { kind: 'tolerance', trials, seed })
    expect(done.state, done.error ?? '').toBe('done')
    expect(done.result).toEqual({ kind: 'tolerance', trials, passed: local.passed, unsolved: 0, yield: local.passed / trials, seed })
    // The yield is neither 0 nor 1, so the comparison says something about the draws.
    expect(local.passed).toBeGreaterThan(0)
    expect(local.passed).toBeLessThan(trials)
  }, 200_000)

  it('runs a network that holds it as a subnetwork, and names a missing data file with 422', async () => {
    const outer = {
      format: 'portwright.network', version: 1.1, name: 'Pair in a box', referenceImpedance: 50,
      sweep: { start: '2.3 GHz', stop: '2.6 GHz', points: 31 },
      spec: { center: 2.45e9, band: { start: 2.4e9, stop: 2.5e9 }, conditions: [{ measure: 'returnLoss', port: 1, min: 20 }] },
      tunables: { 'Pad.db': { min: 0, max: 3 } },
      blocks: [
        { id: 'Pa', type: 'port', params: { index: 1 } }, { id: 'Pb', type: 'port', params: { index: 2 } },
        { id: 'Pad', type: 'attenuator', params: { db: 1 } },
        { id: 'Pair', type: 'subnetwork', params: { network: template.build().name } },
      ],
      wires: [['Pa.1', 'Pad.1'], ['Pad.2', 'Pair.1'], ['Pair.2', 'Pb.1']],
    }
    const made = await owner.client.post(`${base}/networks`, { name: outer.name, document: outer })
    expect(made.status, JSON.stringify(made.body)).toBe(201)
    const done = await runToEnd(made.body.id, { kind: 'optimize', maxEvaluations: 50, seed: 1 })
    expect(done.state, done.error ?? '').toBe('done')
    // Already meets its spec (the pair is matched, a pad only improves the match): met at once.
    expect(done.result).toMatchObject({ kind: 'optimize', met: true })

    const missing = { ...template.build(), name: 'Pair with a file not here' }
    missing.blocks = missing.blocks.map(b => (b.id === 'AmpB' ? { ...b, params: { file: 'other-lna.s2p' } } : b))
    const stray = await owner.client.post(`${base}/networks`, { name: missing.name, document: missing })
    expect(stray.status, JSON.stringify(stray.body)).toBe(201)
    const refused = await owner.client.post(`${base}/networks/${stray.body.id}/jobs`, { kind: 'tolerance', trials: 100, seed: 1 })
    expect(refused.status).toBe(422)
    expect(refused.body.message).toMatch(/AmpB/)
    expect(refused.body.message).toMatch(/other-lna\.s2p/)
  }, 200_000)
})

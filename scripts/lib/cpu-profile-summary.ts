import { readdirSync, readFileSync } from 'node:fs'
import { join } from 'node:path'

interface ProfileNode {
  id: number
  callFrame: { functionName: string, url: string, lineNumber: number }
  children?: number[]
}
interface CpuProfile { nodes: ProfileNode[], samples: number[], timeDeltas: number[], startTime: number, endTime: number }

/** Where a sampled frame's code lives: a package under node_modules, a source file of the app, or V8's own bucket. */
function placeOf(url: string, functionName: string): string {
  if (!url) return functionName.startsWith('(') ? functionName : '(native)'
  const pkg = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url)
  if (pkg) return pkg[1]!
  if (url.startsWith('node:')) return 'node internals'
  const file = url.split('/').slice(-2).join('/')
  return file
}

/** Self time of one profile per function and per place (package or file), in ms. */
function selfTimes(profile: CpuProfile) {
  const byId = new Map(profile.nodes.map(n => [n.id, n]))
  const perNode = new Map<number, number>()
  for (let i = 0; i < profile.samples.length; i++) {
    // Each sample's duration is the gap to the next one.
    const ms = (profile.timeDeltas[i + 1] ?? 0) / 1000
    perNode.set(profile.samples[i]!, (perNode.get(profile.samples[i]!) ?? 0) + ms)
  }
  const functions = new Map<string, number>()
  const places = new Map<string, number>()
  for (const [id, ms] of perNode) {
    const frame = byId.get(id)!.callFrame
    const place = placeOf(frame.url, frame.functionName)
    const name = `${frame.functionName || '(anonymous)'} [${place}${frame.url ? `:${frame.lineNumber + 1}` : ''}]`
    functions.set(name, (functions.get(name) ?? 0) + ms)
    places.set(place, (places.get(place) ?? 0) + ms)
  }
  return { functions, places, totalMs: (profile.endTime - profile.startTime) / 1000 }
}

function top(map: Map<string, number>, totalMs: number, count: number): string[] {
  return [...map].sort((a, b) => b[1] - a[1]).slice(0, count)
    .map(([name, ms]) => `    ${(100 * ms / totalMs).toFixed(1).padStart(5)} %  ${ms.toFixed(0).padStart(7)} ms  ${name}`)
}

/** Prints, for every .cpuprofile in `dir` (one per server process), the top places and functions by self time. */
export function summariseCpuProfiles(dir: string, count = 15): void {
  let files: string[] = []
  try {
    files = readdirSync(dir).filter(f => f.endsWith('.cpuprofile')).sort()
  } catch { /* none written */ }
  if (!files.length) {
    console.log(`no CPU profile was written in ${dir} (the server must exit normally to write one)`)
    return
  }
  for (const file of files) {
    const profile = JSON.parse(readFileSync(join(dir, file), 'utf8')) as CpuProfile
    const { functions, places, totalMs } = selfTimes(profile)
    const busy = totalMs - (places.get('(idle)') ?? 0)
    console.log(`CPU profile ${join(dir, file)}: ${(totalMs / 1000).toFixed(1)} s recorded, ${(busy / 1000).toFixed(1)} s not idle`)
    console.log('  self time by place:')
    for (const line of top(places, totalMs, 10)) console.log(line)
    console.log('  self time by function:')
    for (const line of top(functions, totalMs, count)) console.log(line)
  }
}

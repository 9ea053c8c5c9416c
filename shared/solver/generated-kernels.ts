/**
 * Join kernels generated per join step: the same arithmetic as join-kernels.ts, written out in
 * the same order (so S is bit-identical), with every index a constant and the loop over frequency
 * outermost, so the per-frequency factors and the shared row live in locals instead of memory.
 * Built with `new Function`, which a strict content security policy forbids (the editor's worker
 * runs under one), so they are used only where code generation is known to be allowed: Node.
 */
import { SINGULAR_THRESHOLD_SQUARED } from './join-kernels'

/** A generated join: buffers of A (and B for a merge) in, the joined network out; −1 or the first singular frequency index. */
export type GeneratedJoin = (
  aRe: Float64Array, aIm: Float64Array, bRe: Float64Array, bIm: Float64Array,
  outRe: Float64Array, outIm: Float64Array, count: number,
) => number

const cache = new Map<string, GeneratedJoin>()
/** Kernels kept at most; shapes beyond it are generated again when needed. */
const CACHE_LIMIT = 4096
/**
 * Largest joined network (ports) given generated code: beyond it the function grows with the
 * square of the size past what the JavaScript engine optimises, and the generic loops win.
 */
export const MAX_GENERATED_PORTS = 24
/** Which kernels new solves use: generated ones once warm (the default), always, or never. */
export type KernelChoice = 'auto' | 'generated' | 'generic'
let choice: KernelChoice = 'auto'
let workDone = 0
/**
 * Joins × frequencies solved with the generic kernels before code is generated, process-wide.
 * Compiling the generated functions costs about as much CPU as this much generic work (some
 * 200 ms for the beamforming matrix), so a one-off solve never pays for compilation and a process
 * that keeps solving (server, benchmarks, repeated edits) soon runs the faster code.
 */
export const GENERATE_AFTER_WORK = 1_000_000

/** Whether this runtime may generate code: Node (tsx, scripts, server), not a browser page or worker. */
export function codeGenerationAllowed(): boolean {
  const runtime = globalThis as { process?: { versions?: { node?: string } }; window?: unknown; importScripts?: unknown }
  return choice !== 'generic' && typeof runtime.process?.versions?.node === 'string' && runtime.window === undefined && runtime.importScripts === undefined
}

/** Counts generic join work (joins × frequencies); true once generated kernels should be used. */
export function generationDue(work: number): boolean {
  if (choice === 'generated') return true
  workDone += work
  return workDone >= GENERATE_AFTER_WORK
}

/** For tests and benchmarks: which kernels solves use from now on. */
export function chooseKernels(value: KernelChoice): void {
  choice = value
}

const at = (i: number, j: number, n: number, symmetric: boolean): number => (symmetric && i > j ? j * n + i : i * n + j)

function build(key: string, lines: string[]): GeneratedJoin {
  let fn = cache.get(key)
  if (!fn) {
    // eslint-disable-next-line no-new-func
    fn = new Function('aR', 'aI', 'bR', 'bI', 'oR', 'oI', 'count', lines.join('\n')) as GeneratedJoin
    if (cache.size >= CACHE_LIMIT) cache.clear()
    cache.set(key, fn)
  }
  return fn
}

/** A generated `mergeNetworks` for port k of an m-port joined to port l of an n-port, frequency stride C. */
export function generatedMerge(m: number, k: number, n: number, l: number, symmetric: boolean, C: number): GeneratedJoin {
  const key = `M${m},${k},${n},${l},${symmetric ? 1 : 0},${C}`
  const cached = cache.get(key)
  if (cached) return cached
  const size = m + n - 2
  const kkA = (k * m + k) * C, llB = (l * n + l) * C
  const L: string[] = []
  L.push('for (let q = 0; q < count; q++) {')
  L.push(`const akkR = aR[${kkA} + q], akkI = aI[${kkA} + q], bllR = bR[${llB} + q], bllI = bI[${llB} + q];`)
  L.push('const dR = 1 - (akkR * bllR - akkI * bllI);')
  L.push('const dI = -(akkR * bllI + akkI * bllR);')
  L.push('const dd = dR * dR + dI * dI;')
  L.push(`if (!(dd > ${SINGULAR_THRESHOLD_SQUARED})) return q;`)
  L.push('const iR = dR / dd, iI = -dI / dd;')
  // Row k of A and row l of B, read once per frequency.
  for (let j = 0; j < m; j++) if (j !== k) L.push(`const ak${j}R = aR[${at(k, j, m, symmetric) * C} + q], ak${j}I = aI[${at(k, j, m, symmetric) * C} + q];`)
  for (let j = 0; j < n; j++) if (j !== l) L.push(`const bl${j}R = bR[${at(l, j, n, symmetric) * C} + q], bl${j}I = bI[${at(l, j, n, symmetric) * C} + q];`)
  for (let i = 0; i < m; i++) {
    if (i === k) continue
    const oi = i < k ? i : i - 1
    const ik = at(i, k, m, symmetric) * C
    L.push('{')
    L.push(`const xR = aR[${ik} + q], xI = aI[${ik} + q];`)
    L.push('const yR = xR * iR - xI * iI, yI = xR * iI + xI * iR;')
    L.push('const pR = yR, pI = yI;')
    L.push('const cR = yR * bllR - yI * bllI, cI = yR * bllI + yI * bllR;')
    for (let j = symmetric ? i : 0; j < m; j++) {
      if (j === k) continue
      const oj = j < k ? j : j - 1
      const src = (i * m + j) * C, dst = (oi * size + oj) * C
      L.push(`oR[${dst} + q] = aR[${src} + q] + cR * ak${j}R - cI * ak${j}I; oI[${dst} + q] = aI[${src} + q] + cR * ak${j}I + cI * ak${j}R;`)
    }
    for (let j = 0; j < n; j++) {
      if (j === l) continue
      const oj = m - 1 + (j < l ? j : j - 1)
      const dst = (oi * size + oj) * C
      L.push(`oR[${dst} + q] = pR * bl${j}R - pI * bl${j}I; oI[${dst} + q] = pR * bl${j}I + pI * bl${j}R;`)
    }
    L.push('}')
  }
  for (let i = 0; i < n; i++) {
    if (i === l) continue
    const oi = m - 1 + (i < l ? i : i - 1)
    const il = at(i, l, n, symmetric) * C
    L.push('{')
    L.push(`const xR = bR[${il} + q], xI = bI[${il} + q];`)
    L.push('const yR = xR * iR - xI * iI, yI = xR * iI + xI * iR;')
    L.push('const pR = yR, pI = yI;')
    L.push('const cR = yR * akkR - yI * akkI, cI = yR * akkI + yI * akkR;')
    if (!symmetric) {
      for (let j = 0; j < m; j++) {
        if (j === k) continue
        const oj = j < k ? j : j - 1
        const dst = (oi * size + oj) * C
        L.push(`oR[${dst} + q] = pR * ak${j}R - pI * ak${j}I; oI[${dst} + q] = pR * ak${j}I + pI * ak${j}R;`)
      }
    }
    for (let j = symmetric ? i : 0; j < n; j++) {
      if (j === l) continue
      const oj = m - 1 + (j < l ? j : j - 1)
      const src = (i * n + j) * C, dst = (oi * size + oj) * C
      L.push(`oR[${dst} + q] = bR[${src} + q] + cR * bl${j}R - cI * bl${j}I; oI[${dst} + q] = bI[${src} + q] + cR * bl${j}I + cI * bl${j}R;`)
    }
    L.push('}')
  }
  L.push('}')
  L.push('return -1;')
  return build(key, L)
}

/** A generated `closeLoop` joining ports k and l of an n-port, frequency stride C. */
export function generatedLoop(n: number, k: number, l: number, symmetric: boolean, C: number): GeneratedJoin {
  const key = `L${n},${k},${l},${symmetric ? 1 : 0},${C}`
  const cached = cache.get(key)
  if (cached) return cached
  const size = n - 2
  const kk = (k * n + k) * C, ll = (l * n + l) * C, kl = at(k, l, n, symmetric) * C, lk = at(l, k, n, symmetric) * C
  const L: string[] = []
  L.push('for (let q = 0; q < count; q++) {')
  L.push(`const ekR = 1 - aR[${kl} + q], ekI = -aI[${kl} + q];`)
  L.push(`const elR = 1 - aR[${lk} + q], elI = -aI[${lk} + q];`)
  L.push(`const skkR = aR[${kk} + q], skkI = aI[${kk} + q], sllR = aR[${ll} + q], sllI = aI[${ll} + q];`)
  L.push('const dR = ekR * elR - ekI * elI - (skkR * sllR - skkI * sllI);')
  L.push('const dI = ekR * elI + ekI * elR - (skkR * sllI + skkI * sllR);')
  L.push('const dd = dR * dR + dI * dI;')
  L.push(`if (!(dd > ${SINGULAR_THRESHOLD_SQUARED})) return q;`)
  L.push('const iR = dR / dd, iI = -dI / dd;')
  for (let j = 0; j < n; j++) {
    if (j === k || j === l) continue
    L.push(`const k${j}R = aR[${at(k, j, n, symmetric) * C} + q], k${j}I = aI[${at(k, j, n, symmetric) * C} + q];`)
    L.push(`const l${j}R = aR[${at(l, j, n, symmetric) * C} + q], l${j}I = aI[${at(l, j, n, symmetric) * C} + q];`)
  }
  for (let i = 0; i < n; i++) {
    if (i === k || i === l) continue
    const oi = i - (i > k ? 1 : 0) - (i > l ? 1 : 0)
    const ik = at(i, k, n, symmetric) * C, il = at(i, l, n, symmetric) * C
    L.push('{')
    L.push(`const sikR = aR[${ik} + q], sikI = aI[${ik} + q], silR = aR[${il} + q], silI = aI[${il} + q];`)
    L.push('const unR = sikR * sllR - sikI * sllI + silR * elR - silI * elI;')
    L.push('const unI = sikR * sllI + sikI * sllR + silR * elI + silI * elR;')
    L.push('const vnR = sikR * ekR - sikI * ekI + silR * skkR - silI * skkI;')
    L.push('const vnI = sikR * ekI + sikI * ekR + silR * skkI + silI * skkR;')
    L.push('const uR = unR * iR - unI * iI, uI = unR * iI + unI * iR;')
    L.push('const vR = vnR * iR - vnI * iI, vI = vnR * iI + vnI * iR;')
    for (let j = symmetric ? i : 0; j < n; j++) {
      if (j === k || j === l) continue
      const oj = j - (j > k ? 1 : 0) - (j > l ? 1 : 0)
      const src = (i * n + j) * C, dst = (oi * size + oj) * C
      L.push(`oR[${dst} + q] = aR[${src} + q] + uR * k${j}R - uI * k${j}I + vR * l${j}R - vI * l${j}I;`)
      L.push(`oI[${dst} + q] = aI[${src} + q] + uR * k${j}I + uI * k${j}R + vR * l${j}I + vI * l${j}R;`)
    }
    L.push('}')
  }
  L.push('}')
  L.push('return -1;')
  return build(key, L)
}

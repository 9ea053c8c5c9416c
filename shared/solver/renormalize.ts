import { kernelScratch, mergeNetworks } from './join-kernels'

/** S-parameters over frequency in the solver's layout (see SolveResult). */
export interface SParameterData {
  ports: number
  impedances: number[]
  frequencies: Float64Array
  re: Float64Array
  im: Float64Array
}

/**
 * Refers S-parameters to other real port impedances. Each port is joined to an ideal
 * impedance step (old reference on one side, new on the other), which is exactly what a
 * change of reference is; this avoids an explicit matrix inverse.
 */
export function renormalize(data: SParameterData, impedances: number[]): SParameterData {
  const n = data.ports
  if (impedances.length !== n) throw new RangeError(`renormalize needs ${n} impedances, got ${impedances.length}`)
  const points = data.frequencies.length
  const re = new Float64Array(points * n * n)
  const im = new Float64Array(points * n * n)
  const curRe = new Float64Array(n * n), curIm = new Float64Array(n * n)
  const nextRe = new Float64Array(n * n), nextIm = new Float64Array(n * n)
  const scratch = kernelScratch(1)
  const steps = impedances.map((to, i) => {
    const g1 = 1 / data.impedances[i]!, g2 = 1 / to
    const reflect = (g1 - g2) / (g1 + g2), through = (2 * Math.sqrt(g1 * g2)) / (g1 + g2)
    return { re: Float64Array.of(reflect, through, through, -reflect), im: new Float64Array(4) }
  })
  for (let k = 0; k < points; k++) {
    curRe.set(data.re.subarray(k * n * n, (k + 1) * n * n))
    curIm.set(data.im.subarray(k * n * n, (k + 1) * n * n))
    // Each join moves the current first port to the end, so after n joins the order is restored.
    for (let i = 0; i < n; i++) {
      // A step is never singular against a passive network: its reflection is below 1 in magnitude.
      mergeNetworks(curRe, curIm, n, 0, steps[i]!.re, steps[i]!.im, 2, 0, nextRe, nextIm, false, 1, 1, scratch)
      curRe.set(nextRe)
      curIm.set(nextIm)
    }
    re.set(curRe, k * n * n)
    im.set(curIm, k * n * n)
  }
  return { ports: n, impedances: [...impedances], frequencies: data.frequencies, re, im }
}

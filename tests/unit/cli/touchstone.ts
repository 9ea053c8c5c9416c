/** A small Touchstone reader for the tests: enough of versions 1.1 and 2.0 to read back what the writer writes. */
export interface ParsedTouchstone {
  version: '1.1' | '2.0'
  ports: number
  impedances: number[]
  frequencies: number[]
  /** s[k][i][j] = [re, im] of S(i+1)(j+1). */
  s: Array<Array<Array<[number, number]>>>
}

/** Reads RI-format S data in Hz; ports from the caller (1.1 files do not carry them). */
export function readTouchstone(text: string, ports: number): ParsedTouchstone {
  let version: '1.1' | '2.0' = '1.1'
  let reference: number | undefined
  let impedances: number[] | undefined
  let order = '12_21'
  const numbers: number[] = []
  for (const raw of text.split('\n')) {
    const line = raw.replace(/!.*$/, '').trim()
    if (!line) continue
    if (line.startsWith('#')) {
      const fields = line.slice(1).trim().split(/\s+/).map(x => x.toUpperCase())
      if (fields[0] !== 'HZ' || fields[1] !== 'S' || fields[2] !== 'RI' || fields[3] !== 'R') throw new Error(`unexpected option line ${line}`)
      reference = Number(fields[4])
      continue
    }
    if (line.startsWith('[')) {
      const [, key, value] = /^\[([^\]]+)\]\s*(.*)$/.exec(line)!
      if (key === 'Version') version = value === '2.0' ? '2.0' : '1.1'
      if (key === 'Reference') impedances = value!.split(/\s+/).map(Number)
      if (key === 'Two-Port Data Order') order = value!
      continue
    }
    numbers.push(...line.split(/\s+/).map(Number))
  }
  const per = 1 + 2 * ports * ports
  if (numbers.length % per !== 0) throw new Error(`${numbers.length} numbers is not a whole number of frequencies`)
  const frequencies: number[] = []
  const s: ParsedTouchstone['s'] = []
  for (let at = 0; at < numbers.length; at += per) {
    frequencies.push(numbers[at]!)
    const m = Array.from({ length: ports }, () => Array.from({ length: ports }, (): [number, number] => [0, 0]))
    let v = at + 1
    const cells: Array<[number, number]> = ports === 2 && (version === '1.1' || order === '21_12')
      ? [[0, 0], [1, 0], [0, 1], [1, 1]]
      : Array.from({ length: ports * ports }, (_, c): [number, number] => [Math.floor(c / ports), c % ports])
    for (const [i, j] of cells) {
      m[i]![j] = [numbers[v]!, numbers[v + 1]!]
      v += 2
    }
    s.push(m)
  }
  return { version, ports, impedances: impedances ?? Array(ports).fill(reference ?? 50), frequencies, s }
}

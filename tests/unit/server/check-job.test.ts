import { describe, expect, it } from 'vitest'
import { checkJob } from '../../../server/jobs/run-chunk'
import { findTemplate } from '../../../shared/templates/index'
import { dataFileNames } from '../../../shared/network/data-file-names'

const template = findTemplate('balanced-amplifier')!
const file = template.files![0]!

describe('checkJob (the check before a run is queued, the same preparation as each chunk)', () => {
  it('accepts a network whose data file is given, and names the block and file when it is not', () => {
    const document = template.build()
    expect(checkJob({ kind: 'tolerance', document, networks: [], files: [[file.name, file.text()]] })).toEqual([])
    expect(checkJob({ kind: 'optimize', document, networks: [], files: [[file.name, file.text()]] })).toEqual([])
    const missing = checkJob({ kind: 'tolerance', document, networks: [], files: [] })
    expect(missing).toEqual([
      'block AmpA (data), file: data set "lna-invented.s2p" was not found',
      'block AmpB (data), file: data set "lna-invented.s2p" was not found',
    ])
  })

  it('reports a stored file that does not read with its line, never throwing', () => {
    const broken = '# GHZ S RI R 50\n2 0 0 1 0 1 0 0 0\n1 0 0 1 0 1 0 0 0\n'
    const problems = checkJob({ kind: 'tolerance', document: template.build(), networks: [], files: [[file.name, broken]] })
    expect(problems[0]).toMatch(/could not be read: line 3: /)
  })

  it('finds data files inside subnetworks too', () => {
    const inner = template.build()
    const outer = { blocks: [{ id: 'X', type: 'subnetwork', params: { network: inner.name } }] }
    expect(dataFileNames([outer, inner, null, { blocks: 'no' }])).toEqual(['lna-invented.s2p'])
  })
})

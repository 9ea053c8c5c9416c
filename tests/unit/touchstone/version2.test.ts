// Version 2 files (Touchstone File Format Specification Version 2.0, IBIS Open Forum, 2009; Version 2.1, 2024).
// One case per keyword section, named by the section's title [memory]. The files are our own invented data.
import { describe, expect, it } from 'vitest'
import { failure, near, polar, read, s } from './helpers'

const header = (ports: number, frequencies: number, extra: string[] = [], options = '# GHZ S RI R 50') => [
  '[Version] 2.0', options, `[Number of Ports] ${ports}`, ...(ports === 2 ? ['[Two-Port Data Order] 12_21'] : []), `[Number of Frequencies] ${frequencies}`, ...extra,
]

describe('Touchstone 2.0 — "[Version]"', () => {
  it('a version 2 file starts with [Version] 2.0 or 2.1 (after comments)', () => {
    const file = read(['! Quillmere Microwave Lab', '[Version] 2.1', '# GHZ S RI R 50', '[Number of Ports] 1', '[Number of Frequencies] 1', '[Network Data]', '1 0.5 0', '[End]'])
    expect(file.version).toBe('2.1')
    expect(failure(['[Version] 3.0', '# GHZ S RI R 50']).reason).toMatch(/must be 2\.0 or 2\.1/)
    expect(failure(['[Number of Ports] 1']).reason).toMatch(/starts with \[Version\]/)
  })
})

describe('Touchstone 2.0 — "Option Line" in version 2 files', () => {
  it('is required before [Network Data], once', () => {
    expect(failure(['[Version] 2.0', '[Number of Ports] 1', '[Number of Frequencies] 1', '[Network Data]', '1 0 0', '[End]']).reason).toMatch(/option line .* must come before \[Network Data\]/)
    const error = failure([...header(1, 1), '# MHZ S RI R 50', '[Network Data]', '1 0 0', '[End]'])
    expect(error.line).toBe(5)
  })
})

describe('Touchstone 2.0 — "[Number of Ports]"', () => {
  it('is required, a whole number from 1, and checked against the file name', () => {
    expect(failure(['[Version] 2.0', '# GHZ S RI R 50', '[Number of Frequencies] 1', '[Network Data]', '1 0 0', '[End]']).reason).toMatch(/\[Number of Ports\] must come before/)
    expect(failure(['[Version] 2.0', '# GHZ S RI R 50', '[Number of Ports] two']).reason).toMatch(/whole number/)
    expect(failure(['[Version] 2.0', '# GHZ S RI R 50', '[Number of Ports] 65']).reason).toMatch(/at most 64/)
    expect(failure([...header(1, 1), '[Network Data]', '1 0 0', '[End]'], 2).reason).toBe('[Number of Ports] says 1 but the file name says 2')
  })
})

describe('Touchstone 2.0 — "[Two-Port Data Order]"', () => {
  const data = '1 0.11 0 0.12 0 0.21 0 0.22 0'
  it('12_21 lists S11 S12 S21 S22; 21_12 lists S11 S21 S12 S22', () => {
    const a = read(['[Version] 2.0', '# GHZ S RI R 50', '[Number of Ports] 2', '[Two-Port Data Order] 12_21', '[Number of Frequencies] 1', '[Network Data]', data, '[End]'])
    near(s(a, 0, 1, 2), [0.12, 0])
    near(s(a, 0, 2, 1), [0.21, 0])
    const b = read(['[Version] 2.0', '# GHZ S RI R 50', '[Number of Ports] 2', '[Two-Port Data Order] 21_12', '[Number of Frequencies] 1', '[Network Data]', data, '[End]'])
    near(s(b, 0, 2, 1), [0.12, 0])
    near(s(b, 0, 1, 2), [0.21, 0])
  })

  it('is required for two-ports and refused for others', () => {
    expect(failure(['[Version] 2.0', '# GHZ S RI R 50', '[Number of Ports] 2', '[Number of Frequencies] 1', '[Network Data]', data, '[End]']).reason).toMatch(/needs \[Two-Port Data Order\]/)
    expect(failure(['[Version] 2.0', '# GHZ S RI R 50', '[Number of Ports] 3', '[Two-Port Data Order] 12_21']).reason).toMatch(/belongs to two-port files/)
    expect(failure(['[Version] 2.0', '# GHZ S RI R 50', '[Number of Ports] 2', '[Two-Port Data Order] 12-21']).reason).toMatch(/12_21 or 21_12/)
  })
})

describe('Touchstone 2.0 — "[Number of Frequencies]"', () => {
  it('must match the network data exactly', () => {
    expect(failure([...header(1, 2), '[Network Data]', '1 0 0', '[End]']).reason).toBe('[Number of Frequencies] says 2 but [Network Data] has 1')
    const error = failure([...header(1, 1), '[Network Data]', '1 0 0', '2 0 0', '[End]'])
    expect(error.line).toBe(7)
    expect(error.reason).toMatch(/says 1 but \[Network Data\] has more/)
    expect(failure([...header(1, 0)]).reason).toMatch(/at least 1/)
  })
})

describe('Touchstone 2.0 — "[Reference]"', () => {
  it('gives one impedance per port and overrides R; it may continue over several lines', () => {
    const file = read([...header(3, 1, ['[Reference] 50', '75', '  ! third port on its own line', '100']), '[Network Data]',
      '1 0 0 0 0 0 0', '0 0 0 0 0 0', '0 0 0 0 0 0', '[End]'])
    expect(file.impedances).toEqual([50, 75, 100])
    expect(read([...header(1, 1), '[Network Data]', '1 0 0', '[End]']).impedances).toEqual([50])
  })

  it('too few or too many values, or a value that is not positive, are refused', () => {
    expect(failure([...header(2, 1, ['[Reference] 50']), '[Network Data]']).reason).toMatch(/has 1 value but the file has 2 ports/)
    expect(failure([...header(1, 1, ['[Reference] 50 75'])]).reason).toMatch(/more than 1 values/)
    expect(failure([...header(1, 1, ['[Reference] 0'])]).reason).toMatch(/greater than zero/)
  })
})

describe('Touchstone 2.0 — "[Matrix Format]"', () => {
  // A symmetric 3-port: S_ij = 0.i j (so S12 = S21 = 0.12 ...) in the triangle given.
  const check = (file: ReturnType<typeof read>) => {
    near(s(file, 0, 1, 1), [0.11, 0]); near(s(file, 0, 2, 2), [0.22, 0]); near(s(file, 0, 3, 3), [0.33, 0])
    near(s(file, 0, 1, 2), [0.12, 0]); near(s(file, 0, 2, 1), [0.12, 0])
    near(s(file, 0, 1, 3), [0.13, 0]); near(s(file, 0, 3, 1), [0.13, 0])
    near(s(file, 0, 2, 3), [0.23, 0]); near(s(file, 0, 3, 2), [0.23, 0])
  }
  it('Lower lists the lower triangle row by row', () => {
    check(read([...header(3, 1, ['[Matrix Format] Lower']), '[Network Data]', '1 0.11 0', '0.12 0 0.22 0', '0.13 0 0.23 0 0.33 0', '[End]']))
  })
  it('Upper lists the upper triangle row by row', () => {
    check(read([...header(3, 1, ['[Matrix Format] upper']), '[Network Data]', '1 0.11 0 0.12 0 0.13 0', '0.22 0 0.23 0', '0.33 0', '[End]']))
  })
  it('Full lists the whole matrix; anything else is refused', () => {
    check(read([...header(3, 1, ['[Matrix Format] Full']), '[Network Data]', '1 0.11 0 0.12 0 0.13 0', '0.12 0 0.22 0 0.23 0', '0.13 0 0.23 0 0.33 0', '[End]']))
    expect(failure([...header(3, 1, ['[Matrix Format] Diagonal'])]).reason).toMatch(/Full, Lower or Upper/)
  })
})

describe('Touchstone 2.0 — "[Network Data]": Y, Z, H, G in ohms and siemens (not normalised)', () => {
  it('Z of a 100 Ω load at port references 50 Ω and 75 Ω', () => {
    // Γ = (Z − R)/(Z + R) at each port's own reference (common practice).
    const file = read(['[Version] 2.0', '# GHZ Z RI', '[Number of Ports] 2', '[Two-Port Data Order] 12_21', '[Number of Frequencies] 1', '[Reference] 50 75', '[Network Data]', '1 100 0 0 0 0 0 100 0', '[End]'])
    near(s(file, 0, 1, 1), [50 / 150, 0])
    near(s(file, 0, 2, 2), [25 / 175, 0])
  })

  it('Y in siemens: 0.04 S at R = 50 Ω is a 25 Ω load', () => {
    near(s(read([...header(1, 1, [], '# MHZ Y RI R 50'), '[Network Data]', '5 0.04 0', '[End]']), 0, 1, 1), [-25 / 75, 0])
  })

  it('H of a series resistor between unequal references', () => {
    // Series R = 30 Ω between ports of 50 Ω and 75 Ω. Derived by hand from v = V/√R, i = I·√R:
    // S11 = (R + R2 − R1)/(R + R1 + R2), S22 = (R + R1 − R2)/(R + R1 + R2), S21 = 2√(R1R2)/(R + R1 + R2).
    const file = read(['[Version] 2.0', '# GHZ H RI', '[Number of Ports] 2', '[Two-Port Data Order] 21_12', '[Number of Frequencies] 1', '[Reference] 50 75', '[Network Data]', '1 30 0 -1 0 1 0 0 0', '[End]'])
    near(s(file, 0, 1, 1), [55 / 155, 0])
    near(s(file, 0, 2, 2), [(30 + 50 - 75) / 155, 0])
    near(s(file, 0, 2, 1), [(2 * Math.sqrt(50 * 75)) / 155, 0])
  })

  it('G of a shunt conductance', () => {
    // Shunt G = 0.01 S across a 50 Ω line, derived by hand: g11 = G, g12 = −1, g21 = 1, g22 = 0.
    // Pozar, Microwave Engineering, 4th ed., shunt admittance y = G·Z0 = 0.5: S11 = −y/(2 + y) = −0.2, S21 = 2/(2 + y) = 0.8.
    const file = read(['[Version] 2.0', '# GHZ G RI R 50', '[Number of Ports] 2', '[Two-Port Data Order] 12_21', '[Number of Frequencies] 1', '[Network Data]', '1 0.01 0 -1 0 1 0 0 0', '[End]'])
    near(s(file, 0, 1, 1), [-0.2, 0])
    near(s(file, 0, 2, 1), [0.8, 0])
    near(s(file, 0, 1, 2), [0.8, 0])
  })
})

describe('Touchstone 2.0 — "[Number of Noise Frequencies]" and "[Noise Data]"', () => {
  const network = ['[Network Data]', '1 0.5 10 2 80 0.1 20 0.4 -30', '2 0.5 10 2 80 0.1 20 0.4 -30']
  it('noise data follows the network data; Rn is in ohms', () => {
    const file = read(['[Version] 2.0', '# GHZ S MA R 50', '[Number of Ports] 2', '[Two-Port Data Order] 12_21', '[Number of Frequencies] 2', '[Number of Noise Frequencies] 2', ...network, '[Noise Data]', '1.5 0.8 0.5 30 19', '3 1.0 0.4 50 21', '[End]'])
    near(s(file, 0, 1, 2), polar(2, 80))
    expect(file.noise).toEqual([
      { frequency: 1.5e9, nfMinDb: 0.8, gammaOptMagnitude: 0.5, gammaOptDegrees: 30, rnOhms: 19 },
      { frequency: 3e9, nfMinDb: 1.0, gammaOptMagnitude: 0.4, gammaOptDegrees: 50, rnOhms: 21 },
    ])
  })

  it('the count must match, and the keyword is required with [Noise Data]', () => {
    const top = ['[Version] 2.0', '# GHZ S MA R 50', '[Number of Ports] 2', '[Two-Port Data Order] 12_21', '[Number of Frequencies] 2']
    expect(failure([...top, '[Number of Noise Frequencies] 3', ...network, '[Noise Data]', '1.5 0.8 0.5 30 19', '[End]']).reason).toMatch(/says 3 but \[Noise Data\] has 1 line/)
    expect(failure([...top, ...network, '[Noise Data]', '1.5 0.8 0.5 30 19', '[End]']).reason).toMatch(/needs \[Number of Noise Frequencies\]/)
    expect(failure([...top, '[Number of Noise Frequencies] 1', ...network, '[End]']).reason).toMatch(/no \[Noise Data\]/)
  })
})

describe('Touchstone 2.0 — "[End]" and "[Begin Information]"', () => {
  it('[End] is required and last', () => {
    expect(failure([...header(1, 1), '[Network Data]', '1 0 0']).reason).toBe('a version 2 file must end with [End]')
    expect(failure([...header(1, 1), '[Network Data]', '1 0 0', '[End]', '2 0 0']).reason).toBe('nothing may follow [End]')
  })

  it('an information section is skipped whatever it holds', () => {
    const file = read([...header(1, 1, ['[Begin Information]', 'Quillmere fixture 7', '[Anything] 3', '[End Information]']), '[Network Data]', '1 0.2 0', '[End]'])
    near(s(file, 0, 1, 1), [0.2, 0])
  })

  it('unknown and repeated keywords are refused naming them', () => {
    expect(failure([...header(1, 1, ['[Colour] blue'])]).reason).toBe('[Colour] is not a Touchstone keyword')
    expect(failure([...header(1, 1, ['[Number of Frequencies] 1'])]).reason).toMatch(/appears twice \(first on line 4\)/)
    expect(failure([...header(1, 1, ['[Mixed-Mode Order] D1,2 C1,2'])]).reason).toMatch(/mixed-mode/)
  })
})

// Version 1 files (Touchstone File Format Specification Rev 1.1, EIA/IBIS Open Forum, 2002; the same rules
// restated for "Version 1.0 files" in the Touchstone File Format Specification Version 2.0, 2009).
// Section titles [memory]. Every file below is our own invented data shaped by the rules of the section named.
import { describe, expect, it } from 'vitest'
import { failure, near, polar, read, s } from './helpers'

describe('Touchstone 1.1 — "File Format Rules": comments', () => {
  it('a comment starts at ! anywhere on a line, and lines of comments only are skipped', () => {
    const file = read(['! Quillmere bench, fixture A', '# MHZ S RI R 50 ! option line', '  ! indented comment', '100 0.25 -0.5 ! first point', '', '200 0.3 0.1'])
    expect(Array.from(file.frequencies)).toEqual([100e6, 200e6])
    near(s(file, 0, 1, 1), [0.25, -0.5])
    near(s(file, 1, 1, 1), [0.3, 0.1])
  })

  it('CR, LF and CRLF line ends and tabs between numbers are all read', () => {
    const text = '# MHZ S RI R 50\r\n100\t0.25 -0.5\r200 0.3 0.1\n'
    const file = read([text])
    expect(file.frequencies.length).toBe(2)
  })
})

describe('Touchstone 1.1 — "Data Lines": 1-port and 2-port', () => {
  it('1-port: frequency and one pair, in DB, MA and RI', () => {
    // DB: 20·log10|S|; −6.0206 dB is |S| = 0.5 (common practice).
    near(s(read(['# GHZ S DB R 50', '1 -6.020599913279624 30']), 0, 1, 1), polar(0.5, 30), 1e-12)
    near(s(read(['# GHZ S MA R 50', '1 0.5 30']), 0, 1, 1), polar(0.5, 30))
    near(s(read(['# GHZ S RI R 50', '1 0.4 0.3']), 0, 1, 1), [0.4, 0.3])
  })

  it('2-port: one line per frequency in the order S11 S21 S12 S22', () => {
    const file = read(['# HZ S RI R 50', '1e9 0.11 0.01 0.21 0.02 0.12 0.03 0.22 0.04'])
    expect(file.ports).toBe(2)
    near(s(file, 0, 1, 1), [0.11, 0.01])
    near(s(file, 0, 2, 1), [0.21, 0.02])
    near(s(file, 0, 1, 2), [0.12, 0.03])
    near(s(file, 0, 2, 2), [0.22, 0.04])
  })
})

describe('Touchstone 1.1 — "Data Lines": 3-port and 4-port (one matrix row per line)', () => {
  it('3-port: the frequency line holds row 1, the next two lines rows 2 and 3', () => {
    const row = (i: number) => [1, 2, 3].map(j => `${i}.${j} -${i}.${j}`).join(' ')
    const file = read(['# GHZ S RI R 50', `2 ${row(1)}`, `  ${row(2)}`, `  ${row(3)}`, `3 ${row(1)}`, `  ${row(2)}`, `  ${row(3)}`])
    expect(file.ports).toBe(3)
    expect(file.frequencies.length).toBe(2)
    near(s(file, 1, 2, 3), [2.3, -2.3])
    near(s(file, 0, 3, 1), [3.1, -3.1])
  })

  it('4-port: four pairs per line, one row per line', () => {
    const row = (i: number) => [1, 2, 3, 4].map(j => `0.${i}${j} ${j}`).join(' ')
    const file = read(['# GHZ S MA R 50', `5 ${row(1)}`, row(2), row(3), row(4)], 4)
    near(s(file, 0, 4, 2), polar(0.42, 2))
    near(s(file, 0, 1, 4), polar(0.14, 4))
  })

  it('without a file name, the number of ports comes from the first frequency\'s numbers', () => {
    // 3-port: 1 + 2·3² = 19 numbers over three lines.
    const file = read(['# GHZ S RI R 50', '1 1 0 0 0 0 0', '0 0 1 0 0 0', '0 0 0 0 1 0'])
    expect(file.ports).toBe(3)
  })
})

describe('Touchstone 1.1 — "Data Lines": 5-port and above (at most four pairs per line)', () => {
  it('a 6-port row continues over two lines (4 + 2 pairs); each row starts a new line', () => {
    const lines = ['# GHZ S RI R 50']
    for (let i = 1; i <= 6; i++) {
      const pairs = [1, 2, 3, 4, 5, 6].map(j => `${i} ${j}`)
      lines.push(`${i === 1 ? '1.5 ' : '    '}${pairs.slice(0, 4).join(' ')}`, `    ${pairs.slice(4).join(' ')}`)
    }
    const file = read(lines, 6)
    expect(file.ports).toBe(6)
    near(s(file, 0, 5, 6), [5, 6])
    near(s(file, 0, 6, 1), [6, 1])
  })

  it('a frequency must start a new line: a line that runs past the end of a frequency is refused', () => {
    const error = failure(['# GHZ S RI R 50', '1 0 0 0 0 0 0 0 0 2 0 0'], 2)
    expect(error.line).toBe(2)
    expect(error.reason).toMatch(/needs only 9 more \(9 in all for 2 ports\)/)
  })
})

describe('Touchstone 1.1 — "Option Line": Y and Z data normalised to R', () => {
  it('Z-parameters are divided by R: z = 1 at R = 75 is a 75 Ω load, S11 = 0', () => {
    near(s(read(['# MHZ Z RI R 75', '10 1 0']), 0, 1, 1), [0, 0])
  })

  it('Y-parameters are multiplied by R: y = 2 (twice the reference admittance) gives S11 = −1/3', () => {
    // Γ = (1 − y)/(1 + y) for a normalised admittance y (common practice).
    near(s(read(['# MHZ Y RI R 50', '10 2 0']), 0, 1, 1), [-1 / 3, 0])
  })

  it('H- and G-parameters, two-ports only', () => {
    // Series element Z between the ports, derived by hand: h11 = Z, h12 = 1, h21 = −1, h22 = 0 (normalised: z = Z/R).
    const file = read(['# GHZ H RI R 50', '1 2 0 -1 0 1 0 0 0'])
    // Pozar, Microwave Engineering, 4th ed., series impedance: S11 = z/(z + 2), S21 = 2/(z + 2) with z = 2.
    near(s(file, 0, 1, 1), [0.5, 0])
    near(s(file, 0, 2, 1), [0.5, 0])
    const error = failure(['# GHZ H RI R 50', '1 0 0'])
    expect(error.reason).toMatch(/two-ports only/)
  })
})

describe('Touchstone 1.1 — "Noise Parameters" (two-port data only)', () => {
  it('noise rows follow the network data, starting at a frequency that does not rise; R-normalised Rn is kept in ohms', () => {
    const file = read([
      '# GHZ S MA R 50',
      '2 0.9 -20 3.1 160 0.05 70 0.5 -40',
      '4 0.8 -40 2.9 140 0.06 60 0.45 -60',
      '! noise: f, NFmin dB, |Γopt|, angle, Rn/R',
      '2 0.9 0.6 45 0.4',
      '3 1.1 0.55 60 0.38',
    ])
    expect(file.frequencies.length).toBe(2)
    expect(file.noise).toEqual([
      { frequency: 2e9, nfMinDb: 0.9, gammaOptMagnitude: 0.6, gammaOptDegrees: 45, rnOhms: 20 },
      { frequency: 3e9, nfMinDb: 1.1, gammaOptMagnitude: 0.55, gammaOptDegrees: 60, rnOhms: 19 },
    ])
  })

  it('noise rows have five numbers and rising frequencies', () => {
    const base = ['# GHZ S MA R 50', '2 0.9 -20 3.1 160 0.05 70 0.5 -40']
    expect(failure([...base, '1 0.9 0.6 45'], 2).reason).toMatch(/noise data line has 5 numbers/)
    expect(failure([...base, '1 0.9 0.6 45 0.4', '1 0.9 0.6 45 0.4'], 2).reason).toMatch(/not above the one before it/)
  })

  it('outside two-ports a falling frequency is simply out of order', () => {
    const error = failure(['# GHZ S RI R 50', '2 0 0', '1 0 0'])
    expect(error.line).toBe(3)
    expect(error.reason).toBe('the frequency 1 GHz is not above the one before it (2 GHz); frequencies must increase')
  })
})

describe('Touchstone 1.1 — strict reading', () => {
  it('keywords belong to version 2 files', () => {
    expect(failure(['# GHZ S RI R 50', '[Number of Ports] 1', '1 0 0']).reason).toMatch(/version 2 files/)
  })

  it('numbers must be decimal and finite', () => {
    for (const word of ['NaN', 'Infinity', '0x10', '1e999', '1.2.3', '--1']) {
      const error = failure(['# GHZ S RI R 50', `1 ${word} 0`])
      expect(error.line).toBe(2)
    }
  })

  it('the data must not end inside a frequency, and the count must fit the file name', () => {
    expect(failure(['# GHZ S RI R 50', '1 0 0 0 0 0 0 0 0', '0 0 0 0 0 0 0 0'], 3).reason).toMatch(/ends inside the frequency that starts on line 2/)
    expect(failure(['# GHZ S RI R 50', '1 0 0 0 0 0 0 0 0 0 0'])).toBeTruthy()
  })

  it('non-ASCII text outside comments is refused; inside comments it is kept out of the way', () => {
    expect(failure(['# GHZ S RI R 50', '1 0 0 µ']).reason).toMatch(/U\+00B5/)
    expect(read(['! Messung µ', '# GHZ S RI R 50', '1 0 0']).ports).toBe(1)
  })
})

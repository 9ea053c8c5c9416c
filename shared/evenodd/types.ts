/** A complex number as a plain pair. */
export interface Complex { re: number, im: number }

/**
 * Mirror port pairs of a symmetric four-port, ports counted from 1: [[p, p'], [q, q']].
 * p and q lie on one side of the symmetry plane (the half circuit's ports 1 and 2), p' and q'
 * are their mirror images. The branch-line hybrid (1 in, 2 through, 3 coupled, 4 isolated)
 * is [[1, 4], [2, 3]].
 */
export type MirrorPairs = [[number, number], [number, number]]

/** A two-port's S-matrix [[s11, s12], [s21, s22]]. */
export interface TwoPortS { s11: Complex, s12: Complex, s21: Complex, s22: Complex }

/** A two-port's ABCD (chain) matrix. */
export interface Abcd { a: Complex, b: Complex, c: Complex, d: Complex }

/** The two half circuits of a symmetric four-port at one frequency: even (open plane) and odd (short plane). */
export interface ModePair { even: TwoPortS, odd: TwoPortS }

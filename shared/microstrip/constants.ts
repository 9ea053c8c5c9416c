/** Speed of light in vacuum, m/s (exact, SI). */
export const C0 = 299_792_458

/** Permeability of vacuum, H/m (4π·10⁻⁷, the pre-2019 exact value; the difference is below 1e-9). */
export const MU0 = 4e-7 * Math.PI

/** Wave impedance of free space, Ω: η0 = µ0·c0 ≈ 376.73 Ω, the value Hammerstad and Jensen use. */
export const ETA0 = MU0 * C0

/** Nepers to decibels: 20/ln 10 ≈ 8.686. */
export const DB_PER_NEPER = 20 / Math.LN10

/** The lab's working frequency and system impedance for every template. */
export const TEMPLATE_FREQUENCY = 2.45e9
export const TEMPLATE_IMPEDANCE = 50

/** Manufacturing spread of an etched line's impedance: ±3 % as 3σ of a normal spread (common practice for etched boards). */
export const ARM_TOLERANCE = { relative: 0.03, distribution: 'normal' } as const

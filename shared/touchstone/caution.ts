/** Exported results travel without the app's footer, so they carry the caution themselves. */
export const RESULTS_CAUTION = 'Simulated results: verify hardware by measurement. High RF power can injure; follow local exposure and licensing rules.'

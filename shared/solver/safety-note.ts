/** The caution every exported result carries, since it travels without the app's footer. */
export const SAFETY_NOTE = 'Simulated results: verify hardware by measurement. High RF power can injure; follow local exposure and licensing rules.'

import { z } from 'zod'
import type { SpecMask } from '../rf/spec-mask'

const port = z.number().int().min(1)
const pair = z.tuple([port, port])

/** Guards the optional `spec` key of a network document (see shared/rf/spec-mask.ts) before the bandwidth finder reads it. */
export const specMaskSchema: z.ZodType<SpecMask> = z.object({
  center: z.number().positive().finite(),
  conditions: z.array(z.discriminatedUnion('measure', [
    z.object({ measure: z.literal('returnLoss'), port, min: z.number().finite() }),
    z.object({ measure: z.literal('vswr'), port, max: z.number().min(1) }),
    z.object({ measure: z.enum(['insertionLoss', 'isolation', 'coupling']), from: port, to: port, min: z.number().finite().optional(), max: z.number().finite().optional() }),
    z.object({ measure: z.literal('amplitudeImbalance'), from: port, to: pair, max: z.number().min(0) }),
    z.object({ measure: z.literal('phaseDifference'), from: port, to: pair, target: z.number().finite(), tolerance: z.number().min(0) }),
  ])),
})

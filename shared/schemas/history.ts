import { z } from 'zod'

/** Body of restoring a checkpoint: the live network's revision the caller has seen. */
export const restoreCheckpointSchema = z.object({
  revision: z.number({ message: 'revision must be the live network\'s revision.' }).int().positive(),
})

import { z } from 'zod'

const networkName = z.string().trim().min(1, 'Enter a network name.').max(200, 'Network name is too long (200 characters at most).')

/** Body of network creation; the document is checked separately against the contract. */
export const createNetworkSchema = z.object({
  name: networkName,
  document: z.unknown().optional(),
})

/** Body of a network update: the full document plus the revision it was based on. */
export const updateNetworkSchema = z.object({
  revision: z.int().positive('revision must be a positive whole number'),
  document: z.unknown().refine(v => v !== undefined, 'document is required'),
})

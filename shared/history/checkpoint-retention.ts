/** How long checkpoints are kept, and how thinly. */
export const CHECKPOINT_RETENTION = {
  /** Every checkpoint younger than this is kept. */
  keepAllMs: 24 * 3600_000,
  /** Up to this age, the newest checkpoint of each clock hour is kept. */
  hourlyUntilMs: 7 * 24 * 3600_000,
  /** Up to this age, the newest checkpoint of each UTC day is kept; older ones go. */
  dailyUntilMs: 90 * 24 * 3600_000,
} as const

/** While live edits arrive, at most one automatic checkpoint per this interval. */
export const CHECKPOINT_INTERVAL_MS = 5 * 60_000

export interface CheckpointAge {
  id: string
  createdAt: Date
}

/**
 * The checkpoints of one network that retention drops at `now`: all of the last
 * 24 h stay, then the newest of each clock hour up to 7 days, then the newest of
 * each UTC day up to 90 days; older ones go. The newest checkpoint always stays.
 * Buckets are fixed in time (not relative to `now`), so pruning twice drops nothing more.
 */
export function checkpointsToPrune(items: readonly CheckpointAge[], now: Date): string[] {
  const sorted = [...items].sort((a, b) => b.createdAt.getTime() - a.createdAt.getTime())
  const seen = new Set<string>()
  const drop: string[] = []
  sorted.forEach((item, index) => {
    if (index === 0) return
    const age = now.getTime() - item.createdAt.getTime()
    if (age <= CHECKPOINT_RETENTION.keepAllMs) return
    if (age > CHECKPOINT_RETENTION.dailyUntilMs) {
      drop.push(item.id)
      return
    }
    const bucket = age <= CHECKPOINT_RETENTION.hourlyUntilMs
      ? `h${Math.floor(item.createdAt.getTime() / 3600_000)}`
      : `d${Math.floor(item.createdAt.getTime() / 86_400_000)}`
    // Newest first: the first one met in a bucket is the one kept.
    if (seen.has(bucket)) drop.push(item.id)
    else seen.add(bucket)
  })
  return drop
}

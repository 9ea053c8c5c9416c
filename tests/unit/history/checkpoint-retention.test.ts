import { describe, expect, it } from 'vitest'
import { checkpointsToPrune } from '../../../shared/history/checkpoint-retention'

// Invented timestamps: the rule is ours (README "History"), so these check it as stated there.
const now = new Date('2026-06-30T12:00:00Z')
const hoursAgo = (h: number) => new Date(now.getTime() - h * 3600_000)
const at = (id: string, date: Date) => ({ id, createdAt: date })

describe('checkpoint retention', () => {
  it('keeps every checkpoint of the last 24 hours', () => {
    const items = Array.from({ length: 50 }, (_, i) => at(`c${i}`, hoursAgo(i * 0.4)))
    expect(checkpointsToPrune(items, now)).toEqual([])
  })

  it('keeps the newest of each clock hour between one and seven days', () => {
    // Three in the clock hour 2026-06-28 09:00–10:00 UTC (51–53 h old), one in the next hour.
    const items = [
      at('newest', hoursAgo(0)),
      at('h09-a', new Date('2026-06-28T09:50:00Z')),
      at('h09-b', new Date('2026-06-28T09:20:00Z')),
      at('h09-c', new Date('2026-06-28T09:05:00Z')),
      at('h10', new Date('2026-06-28T10:10:00Z')),
    ]
    expect(checkpointsToPrune(items, now).sort()).toEqual(['h09-b', 'h09-c'])
  })

  it('keeps the newest of each UTC day between seven and ninety days, and nothing older', () => {
    const items = [
      at('newest', hoursAgo(1)),
      at('d-late', new Date('2026-06-01T22:00:00Z')),
      at('d-early', new Date('2026-06-01T03:00:00Z')),
      at('d-other', new Date('2026-06-02T03:00:00Z')),
      at('too-old', new Date('2026-03-01T12:00:00Z')),
    ]
    expect(checkpointsToPrune(items, now).sort()).toEqual(['d-early', 'too-old'])
  })

  it('always keeps the newest checkpoint, however old', () => {
    expect(checkpointsToPrune([at('only', hoursAgo(24 * 400)), at('older', hoursAgo(24 * 401))], now)).toEqual(['older'])
  })

  it('drops nothing more when run again on what it kept', () => {
    const items = Array.from({ length: 400 }, (_, i) => at(`c${i}`, hoursAgo(i * i * 0.015)))
    const dropped = new Set(checkpointsToPrune(items, now))
    const kept = items.filter(i => !dropped.has(i.id))
    expect(dropped.size).toBeGreaterThan(0)
    expect(checkpointsToPrune(kept, now)).toEqual([])
  })
})

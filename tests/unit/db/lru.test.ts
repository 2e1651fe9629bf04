import { describe, expect, it } from 'vitest'
import { Lru, lruFor } from '@/db/lru'

describe('Lru', () => {
  it('keeps at most maxEntries, dropping the least recently used', () => {
    const c = new Lru<number, string>(2)
    c.set(1, 'a')
    c.set(2, 'b')
    expect(c.get(1)).toBe('a') // 1 is now the most recent
    c.set(3, 'c')
    expect(c.size).toBe(2)
    expect(c.get(2)).toBeUndefined()
    expect(c.get(1)).toBe('a')
    expect(c.get(3)).toBe('c')
  })

  it('loads a miss once and serves it from the cache after; a missing value is not cached', async () => {
    const c = new Lru<number, string>(4)
    let loads = 0
    const load = async () => { loads++; return 'x' }
    expect(await c.getOrLoad(7, load)).toBe('x')
    expect(await c.getOrLoad(7, load)).toBe('x')
    expect(loads).toBe(1)
    let misses = 0
    const none = async () => { misses++; return undefined }
    expect(await c.getOrLoad(8, none)).toBeUndefined()
    expect(await c.getOrLoad(8, none)).toBeUndefined()
    expect(misses).toBe(2)
  })

  it('refuses a size that is not a positive integer', () => {
    expect(() => new Lru(0)).toThrow(/maxEntries must be a positive integer, got 0/)
    expect(() => new Lru(1.5)).toThrow(/maxEntries/)
  })

  it('gives one cache per owner and name, so a new database handle starts empty', () => {
    const a = {}
    const b = {}
    lruFor<number, string>(a, 't', 3).set(1, 'from a')
    expect(lruFor<number, string>(a, 't', 3).get(1)).toBe('from a')
    expect(lruFor<number, string>(b, 't', 3).get(1)).toBeUndefined()
    expect(lruFor<number, string>(a, 'other', 3).get(1)).toBeUndefined()
  })
})

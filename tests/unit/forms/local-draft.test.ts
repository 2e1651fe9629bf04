// Drafts kept in the browser: read back through a schema, an unreadable one dropped without a throw.
import { describe, expect, it } from 'vitest'
import { z } from 'zod'
import { readDraft, removeDraft, writeDraft, type DraftStorage } from '@/app/_components/local-draft'
import { mapDraftKey, mapDraftSchema } from '@/app/_components/map-grid/draft-storage'
import { reportDraftKey, reportDraftSchema } from '@/app/(app)/reports/report-draft'
import { small } from '@/tests/support/fixtures'

/** localStorage's contract on a Map; `fail` makes the named calls throw like a blocked or full storage. */
function memoryStorage(fail: { get?: boolean; set?: boolean; remove?: boolean } = {}): DraftStorage & { items: Map<string, string> } {
  const items = new Map<string, string>()
  return {
    items,
    getItem: (k) => {
      if (fail.get) throw new Error('SecurityError: storage blocked')
      return items.get(k) ?? null
    },
    setItem: (k, v) => {
      if (fail.set) throw new Error('QuotaExceededError')
      items.set(k, v)
    },
    removeItem: (k) => {
      if (fail.remove) throw new Error('SecurityError: storage blocked')
      items.delete(k)
    },
  }
}

const point = z.object({ x: z.number(), label: z.string().default('') })

describe('local drafts', () => {
  it('gives back what was written, through the schema (defaults filled in)', () => {
    const s = memoryStorage()
    expect(writeDraft(s, 'k', { x: 3 })).toBe(true)
    expect(readDraft(s, 'k', point)).toEqual({ x: 3, label: '' })
  })

  it('is null when nothing is stored or there is no storage', () => {
    expect(readDraft(memoryStorage(), 'k', point)).toBeNull()
    expect(readDraft(null, 'k', point)).toBeNull()
    expect(writeDraft(null, 'k', { x: 1 })).toBe(false)
  })

  it('discards a draft that fails the schema, and one that is not JSON', () => {
    const s = memoryStorage()
    s.items.set('old', JSON.stringify({ x: 'three' }))
    s.items.set('torn', '{"x": 3')
    s.items.set('other', JSON.stringify({ x: 1 }))
    expect(readDraft(s, 'old', point)).toBeNull()
    expect(readDraft(s, 'torn', point)).toBeNull()
    expect([...s.items.keys()]).toEqual(['other'])
  })

  it('survives a storage that throws on every call', () => {
    const s = memoryStorage({ get: true, set: true, remove: true })
    expect(readDraft(s, 'k', point)).toBeNull()
    expect(writeDraft(s, 'k', { x: 1 })).toBe(false)
    expect(() => removeDraft(s, 'k')).not.toThrow()
  })

  it('a full storage refuses the write and keeps the previous draft', () => {
    const s = memoryStorage()
    writeDraft(s, 'k', { x: 1 })
    const full = { ...s, setItem: () => { throw new Error('QuotaExceededError') } }
    expect(writeDraft(full, 'k', { x: 2 })).toBe(false)
    expect(readDraft(s, 'k', point)).toEqual({ x: 1, label: '' })
  })
})

describe('the map editor draft', () => {
  const draft = { baseNumber: 2, baseTable: small(), table: { ...small(), values: [[0, 0, 0], [410, 300, 100], [800, 700, 400]] }, message: 'why', notes: '', savedAt: '2026-01-01T00:00:00.000Z' }

  it('round-trips one draft per map under its key', () => {
    const s = memoryStorage()
    writeDraft(s, mapDraftKey(7), draft)
    expect(readDraft(s, mapDraftKey(7), mapDraftSchema)).toEqual(draft)
    expect(readDraft(s, mapDraftKey(8), mapDraftSchema)).toBeNull()
    expect(mapDraftKey(7)).toBe('mapwright:draft:map-7') // the key drafts were stored under before; kept so they still load
  })

  it('drops a draft whose table is not a map table (ragged rows)', () => {
    const s = memoryStorage()
    writeDraft(s, mapDraftKey(7), { ...draft, table: { ...draft.table, values: [[0, 0], [1, 1, 1], [2, 2, 2]] } })
    expect(readDraft(s, mapDraftKey(7), mapDraftSchema)).toBeNull()
    expect(s.items.size).toBe(0)
  })
})

describe('the drive report draft', () => {
  it('keeps a half-filled form, dropping only the fields of the wrong type', () => {
    const s = memoryStorage()
    // What the form stores mid-way: an emptied number input is NaN, which JSON writes as null.
    const stored = {
      values: { setId: 9, vehicleUnit: 'BX-07', route: '', ambientC: null, surface: 'mud', ratings: { launch: 3 }, flags: [{ map: 'regen', pedalPct: 60, speedKmh: null, what: '', severity: 2 }, { map: 'sideways', pedalPct: 10, what: 'x', severity: 1 }] },
      programId: 4,
      savedAt: '2026-01-01T00:00:00.000Z',
    }
    s.items.set(reportDraftKey(), JSON.stringify(stored))
    expect(readDraft(s, reportDraftKey(), reportDraftSchema)).toEqual({
      values: { setId: 9, vehicleUnit: 'BX-07', route: '', ratings: { launch: 3 }, flags: [{ map: 'regen', pedalPct: 60, what: '', severity: 2 }, { pedalPct: 10, what: 'x', severity: 1 }] },
      programId: 4,
      savedAt: '2026-01-01T00:00:00.000Z',
    })
  })

  it('keeps a draft from before sets, without the revision it named (the driver picks the set again)', () => {
    const s = memoryStorage()
    s.items.set(reportDraftKey(), JSON.stringify({ values: { revisionId: 5, route: 'Ramp 3' }, mapId: 4, revisionNumber: 2, savedAt: '2026-01-01T00:00:00.000Z' }))
    expect(readDraft(s, reportDraftKey(), reportDraftSchema)).toEqual({ values: { route: 'Ramp 3' }, savedAt: '2026-01-01T00:00:00.000Z' })
  })

  it('discards a stored value that is not a draft object at all, with no throw', () => {
    const s = memoryStorage()
    s.items.set(reportDraftKey(12), JSON.stringify(['not', 'a', 'draft']))
    expect(readDraft(s, reportDraftKey(12), reportDraftSchema)).toBeNull()
    expect(s.items.has(reportDraftKey(12))).toBe(false)
  })

  it('keeps separate drafts for a new report and each edited one', () => {
    expect(new Set([reportDraftKey(), reportDraftKey(3), reportDraftKey(4)]).size).toBe(3)
  })
})

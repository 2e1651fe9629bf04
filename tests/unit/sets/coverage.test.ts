import { describe, expect, it } from 'vitest'
import { coverageKey, setCoverage } from '@/app/_lib/sets/gate'
import type { ReleaseConditions } from '@/db/schema'

const C: ReleaseConditions = { surfaces: ['wet-asphalt', 'packed-snow'], loadCases: ['empty', 'laden'], marginPct: 10 }

describe('setCoverage: drive reports per release condition', () => {
  it('counts reports per declared surface × load case, surface-major, and ignores undeclared ones', () => {
    const cov = setCoverage(C, [
      { surface: 'wet-asphalt', loadCase: 'empty' }, { surface: 'wet-asphalt', loadCase: 'empty' },
      { surface: 'packed-snow', loadCase: 'laden' }, { surface: 'ice', loadCase: 'empty' },
    ], [])
    expect(cov.map((c) => [c.key, c.reports, c.waiver])).toEqual([
      ['coverage:wet-asphalt:empty', 2, null], ['coverage:wet-asphalt:laden', 0, null],
      ['coverage:packed-snow:empty', 0, null], ['coverage:packed-snow:laden', 1, null],
    ])
  })
  it('takes a waiver only for an empty cell and only with a reason (trimmed)', () => {
    const cov = setCoverage(C, [{ surface: 'wet-asphalt', loadCase: 'empty' }], [
      { key: coverageKey('wet-asphalt', 'empty'), reason: 'covered anyway' },
      { key: coverageKey('wet-asphalt', 'laden'), reason: '  track closed  ' },
      { key: coverageKey('packed-snow', 'empty'), reason: '   ' },
    ])
    expect(cov.map((c) => c.waiver)).toEqual([null, 'track closed', null, null])
  })
})

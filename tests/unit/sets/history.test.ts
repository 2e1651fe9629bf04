import { describe, expect, it } from 'vitest'
import { otherSetIds, setHistory, withdrawnBy, type HistoryAuditRow, type HistoryRelease } from '@/app/(app)/sets/[id]/history'

const t = (s: string) => new Date(`2026-03-0${s}Z`)
const release = (r: Partial<HistoryRelease> & { id: number; releasedAt: Date }): HistoryRelease => ({ releasedByName: 'Lead A', acknowledgements: [], retiredAt: null, withdrawnAt: null, withdrawReason: null, ...r })
const audit = (a: Partial<HistoryAuditRow> & { id: number; at: Date; action: string; entityId: number }): HistoryAuditRow => ({ actorName: 'Lead B', details: {}, ...a })

describe('setHistory', () => {
  it('tells a set that was never released as made only', () => {
    const h = setHistory({ setId: 7, createdAt: t('1T08:00:00'), createdByName: 'Eng C', releases: [], audit: [], setNumbers: new Map() })
    expect(h).toEqual([{ at: t('1T08:00:00'), kind: 'created', by: 'Eng C', text: 'Set made' }])
  })

  it('names who replaced the release, who brought it back and who withdrew it, oldest first', () => {
    const releases = [release({ id: 11, releasedAt: t('2T09:00:00'), acknowledgements: [{}], withdrawnAt: t('5T10:00:00'), withdrawReason: 'brake judder' })]
    const rows = [
      audit({ id: 1, at: t('3T09:00:01'), action: 'set.release', entityId: 8, actorName: 'Lead D', details: { replacedSetId: 7 } }),
      audit({ id: 2, at: t('4T09:00:00'), action: 'set.withdraw', entityId: 8, details: { restoredSetId: 7, reason: 'oscillation' } }),
      audit({ id: 3, at: t('5T10:00:00'), action: 'set.withdraw', entityId: 7, actorName: 'Lead E', details: { releaseId: 11, restoredSetId: null } }),
      audit({ id: 4, at: t('3T12:00:00'), action: 'set.release', entityId: 9, details: { replacedSetId: 8 } }),
    ]
    const h = setHistory({ setId: 7, createdAt: t('1T08:00:00'), createdByName: null, releases, audit: rows, setNumbers: new Map([[8, 4]]) })
    expect(h.map((e) => [e.kind, e.by, e.text, e.reason])).toEqual([
      ['created', null, 'Set made', undefined],
      ['released', 'Lead A', 'Released, with 1 traction exception(s) acknowledged', undefined],
      ['replaced', 'Lead D', 'Replaced by the release of Set 4', undefined],
      ['brought-back', 'Lead B', 'Released again: the release of Set 4 that had replaced it was withdrawn', 'oscillation'],
      ['withdrawn', 'Lead E', 'Release withdrawn', 'brake judder'],
    ])
    expect(withdrawnBy(7, 11, rows)).toBe('Lead E')
    expect(otherSetIds(7, rows)).toEqual([8])
  })

  it('still shows a retirement no audit row explains, without naming anyone', () => {
    const releases = [release({ id: 11, releasedAt: t('2T09:00:00'), retiredAt: t('3T09:00:00') })]
    const h = setHistory({ setId: 7, createdAt: t('1T08:00:00'), createdByName: 'Eng C', releases, audit: [], setNumbers: new Map() })
    expect(h.at(-1)).toEqual({ at: t('3T09:00:00'), kind: 'replaced', by: null, text: 'Replaced by a later release' })
  })

  it('does not repeat a retirement its audit row already tells', () => {
    const releases = [release({ id: 11, releasedAt: t('2T09:00:00'), retiredAt: t('3T09:00:00') })]
    const rows = [audit({ id: 1, at: t('3T09:00:02'), action: 'set.release', entityId: 8, details: { replacedSetId: 7 } })]
    const h = setHistory({ setId: 7, createdAt: t('1T08:00:00'), createdByName: 'Eng C', releases, audit: rows, setNumbers: new Map() })
    expect(h.filter((e) => e.kind === 'replaced')).toHaveLength(1)
    expect(h.at(-1)?.text).toBe('Replaced by the release of another set')
  })
})

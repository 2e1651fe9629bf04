// The release gate asks for drive reports that together cover every declared release condition (surface × load
// case), or a lead's waiver with a reason for each one left uncovered, kept with the release and audited.
import { strFromU8, unzipSync } from 'fflate'
import { describe, expect, it } from 'vitest'
import { listAudit } from '@/db/queries/audit'
import { makeUser, sessionCookie } from '@/tests/support/api'
import { approve, downloadPackage, fileSetReport, gateMet, getSetView, makeSet, releaseSet, setSetup } from '@/tests/support/set-fixtures'

// The fixture program keeps the default release conditions: wet asphalt and packed snow × empty and laden.
const ALL = ['coverage:wet-asphalt:empty', 'coverage:wet-asphalt:laden', 'coverage:packed-snow:empty', 'coverage:packed-snow:laden']

/** An approved set with one clean report on wet asphalt, empty: three conditions uncovered. */
async function oneReportSet() {
  const s = await setSetup()
  await approve(s, s.driveRevisionId)
  await approve(s, s.regenRevisionId)
  const setId = await makeSet(s)
  await fileSetReport(setId, s.driverCookie, { surface: 'wet-asphalt', loadCase: 'empty' })
  return { ...s, setId }
}

const laden = { loadCase: 'laden', payloadKg: 18_000 }

describe('drive-report coverage of the release conditions', () => {
  it('refuses the release while a condition has no report, and shows the grid', async () => {
    const s = await oneReportSet()
    const view = await getSetView(s.setId, s.leadCookie)
    expect(gateMet(view)).toMatchObject({ 'drive-report': true, coverage: false, traction: true, safety: true })
    expect(view.body.gate.coverage.map((c: { key: string; reports: number }) => [c.key, c.reports])).toEqual([[ALL[0], 1], [ALL[1], 0], [ALL[2], 0], [ALL[3], 0]])
    expect(view.body.gate.uncovered).toEqual(ALL.slice(1))
    const refused = await releaseSet(s.setId, s.leadCookie)
    expect(refused.status).toBe(409)
    expect(refused.body.error.message).toMatch(/3 of 4 release condition\(s\) have no drive report and no waiver/)
  })

  it('passes once reports cover every condition', async () => {
    const s = await oneReportSet()
    await fileSetReport(s.setId, s.driverCookie, { surface: 'wet-asphalt', ...laden })
    await fileSetReport(s.setId, s.driverCookie, { surface: 'packed-snow', loadCase: 'empty' })
    expect(gateMet(await getSetView(s.setId, s.leadCookie)).coverage).toBe(false) // one still open
    await fileSetReport(s.setId, s.driverCookie, { surface: 'packed-snow', ...laden })
    expect(gateMet(await getSetView(s.setId, s.leadCookie)).coverage).toBe(true)
    expect((await releaseSet(s.setId, s.leadCookie)).status).toBe(200)
  })

  it('passes with a lead waiver and its reason per uncovered condition, kept with the release, audited and in the package', async () => {
    const s = await oneReportSet()
    const reason = 'Snow track closed this winter; laden wet run scheduled for the next set'
    expect((await releaseSet(s.setId, s.leadCookie, [{ key: ALL[1], reason }])).status).toBe(409) // two still open
    const res = await releaseSet(s.setId, s.leadCookie, ALL.slice(1).map((key) => ({ key, reason })))
    expect(res.status).toBe(200)
    const view = await getSetView(s.setId, s.leadCookie)
    expect(gateMet(view).coverage).toBe(true) // the release's waivers count
    expect(view.body.gate.coverage.filter((c: { waiver: string | null }) => c.waiver === reason)).toHaveLength(3)
    const rel = view.body.set.releases[0]
    expect(rel.coverageWaivers.map((w: { key: string; reason: string; byId: number }) => [w.key, w.reason, w.byId])).toEqual(ALL.slice(1).map((k) => [k, reason, s.lead.id]))
    const [audit] = await listAudit({ entityType: 'map_set', entityId: s.setId, action: 'set.release' })
    expect((audit.details as { coverageWaivers: unknown[] }).coverageWaivers).toEqual(ALL.slice(1).map((key) => ({ key, reason })))
    const manifest = JSON.parse(strFromU8(unzipSync((await downloadPackage(s.setId, s.cookie)).bytes)['manifest.json']))
    expect(manifest.coverageWaivers.map((w: { key: string; by: string }) => [w.key, w.by])).toEqual(ALL.slice(1).map((k) => [k, s.lead.name]))
  })

  it('refuses a waiver without a reason, for a covered condition, or from anyone but a lead engineer', async () => {
    const s = await oneReportSet()
    const blank = await releaseSet(s.setId, s.leadCookie, ALL.slice(1).map((key, i) => ({ key, reason: i === 0 ? '   ' : 'r' })))
    expect(blank.status).toBe(400)
    expect(blank.body.error.message).toMatch(/reason/)
    const covered = await releaseSet(s.setId, s.leadCookie, ALL.map((key) => ({ key, reason: 'r' })))
    expect(covered.status).toBe(400)
    expect(covered.body.error.message).toMatch(/coverage:wet-asphalt:empty match no exception or uncovered release condition/)
    const waivers = ALL.slice(1).map((key) => ({ key, reason: 'r' }))
    for (const role of ['calibration_engineer', 'test_driver'] as const) {
      const cookie = await sessionCookie(await makeUser(role))
      expect((await releaseSet(s.setId, cookie, waivers)).status).toBe(403)
    }
    expect(gateMet(await getSetView(s.setId, s.leadCookie)).coverage).toBe(false) // nothing was recorded
  })
})

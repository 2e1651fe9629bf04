import { describe, expect, it } from 'vitest'
import { getMapWithRevision, getRevisionWithMap, listLatestRevisions } from '@/db/queries/maps'
import { loadMap, loadMapRevision, loadRevision } from '@/app/_lib/maps/access'
import { saveRevision } from '@/db/queries/revisions'
import { waitingFor } from '@/app/_lib/review/waiting'
import { limitsFromVehicle, validate } from '@/maps'
import { makeUser } from '@/tests/support/api'
import { programAndMap, SMALL_DRIVE, withCell } from '@/tests/support/fixtures'

// Far above any motor envelope of the demo programs: a validation error, whatever the vehicle.
const OVER_ENVELOPE = withCell(SMALL_DRIVE, 1, 1, 100_000)

async function save(mapId: number, authorId: number, parentNumber: number, table = SMALL_DRIVE) {
  const r = await saveRevision({ mapId, parentNumber, authorId, message: `r${parentNumber + 1}`, notes: '', table })
  if (!r.ok) throw new Error(`save failed: ${r.reason}`)
  return r.revision
}

describe('one query for a revision with its map and program', () => {
  it('returns the revision by row id with its table, author, state, map and program parameters', async () => {
    const { mapId, engineer } = await programAndMap()
    const saved = await save(mapId, engineer.id, 1, OVER_ENVELOPE)
    const found = await getRevisionWithMap(saved.id)
    expect(found?.revision).toMatchObject({ id: saved.id, mapId, number: 2, authorId: engineer.id, authorName: engineer.name, state: 'draft', checksum: saved.checksum })
    expect(found?.revision.table).toEqual(OVER_ENVELOPE)
    expect(found?.map).toMatchObject({ id: mapId, name: 'Launch', kind: 'drive' })
    expect(found?.map.programParams.axleLayout).toBeDefined()
    expect(found?.map.programReleaseConditions.marginPct).toBe(10)
    expect(await getRevisionWithMap(2_000_000_000)).toBeNull()
  })

  it('lists the latest revision of every map, and the overview names only maps whose latest revision has an error', async () => {
    const fixed = await programAndMap(OVER_ENVELOPE)
    await save(fixed.mapId, fixed.engineer.id, 1)
    const broken = await programAndMap()
    await save(broken.mapId, broken.engineer.id, 1)
    await save(broken.mapId, broken.engineer.id, 2, OVER_ENVELOPE)

    const latest = await listLatestRevisions()
    const byMap = new Map(latest.map((r) => [r.mapId, r]))
    expect(byMap.get(fixed.mapId)?.number).toBe(2)
    expect(byMap.get(broken.mapId)?.number).toBe(3)
    expect(byMap.get(broken.mapId)?.table).toEqual(OVER_ENVELOPE)
    expect(validate(OVER_ENVELOPE, limitsFromVehicle(byMap.get(broken.mapId)!.programParams)).some((f) => f.severity === 'error')).toBe(true)

    const engineer = await makeUser('calibration_engineer')
    const boxes = await waitingFor(engineer)
    const findings = boxes.find((b) => b.testId === 'waiting-findings')
    const hrefs = findings?.items.map((i) => i.href) ?? []
    expect(hrefs).toContain(`/maps/${broken.mapId}/edit`)
    expect(hrefs).not.toContain(`/maps/${fixed.mapId}/edit`)
    expect(findings?.items.find((i) => i.href === `/maps/${broken.mapId}/edit`)?.label).toMatch(/ · Launch r3$/)
  })

  it('reads a map with one revision in one query, and a miss fails as loadMap then loadRevision would', async () => {
    const { mapId, engineer } = await programAndMap()
    await save(mapId, engineer.id, 1, OVER_ENVELOPE)
    const one = await loadMapRevision(String(mapId), '1')
    expect(one).toEqual({ map: await loadMap(String(mapId)), revision: await loadRevision(mapId, '1') })
    expect((await loadMapRevision(String(mapId), 'latest')).revision.table).toEqual(OVER_ENVELOPE)
    expect((await getMapWithRevision(mapId))?.revision.number).toBe(2)
    const missing = String(2_000_000_000)
    await expect(loadMapRevision(String(mapId), '3')).rejects.toMatchObject({ status: 404, message: expect.stringContaining(`Revision 3 of map ${mapId}`) })
    await expect(loadMapRevision(missing, '1')).rejects.toMatchObject({ status: 404, message: expect.stringContaining(`Map ${missing}`) })
    // The map is checked before the number, as before: a missing map with a bad number is still a 404.
    await expect(loadMapRevision(missing, 'abc')).rejects.toMatchObject({ status: 404 })
    await expect(loadMapRevision(String(mapId), 'abc')).rejects.toMatchObject({ status: 404 })
  })
})

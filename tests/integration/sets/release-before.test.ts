// A released set compares with the release it followed in the trucks: the first release has none,
// the second names the first with the cell changes of each map, and a release withdrawn before
// the later one was made is skipped (it was no longer in the trucks).
import { describe, expect, it } from 'vitest'
import { compareWithReleaseBefore } from '@/app/_lib/sets/release-before'
import { getSet } from '@/db/queries/sets'
import { approve, fileCoveringReports, GENTLE_REGEN, makeSet, releaseSet, saveRevision, setSetup, withdrawSet } from '@/tests/support/set-fixtures'
import { GENTLE } from '@/tests/support/review-fixtures'

async function releaseOf(s: Awaited<ReturnType<typeof setSetup>>, id: number) {
  await fileCoveringReports(id, s.driverCookie)
  const res = await releaseSet(id, s.leadCookie)
  if (res.status !== 200) throw new Error(JSON.stringify(res.body))
  const set = (await getSet(id))!
  return compareWithReleaseBefore({ programId: set.programId, releasedAt: set.releases[0].releasedAt, drive: set.drive, regen: set.regen })
}

describe('the release before', () => {
  it('is none for the first release, then the first release with each map changed or the same', async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const first = await makeSet(s)
    expect(await releaseOf(s, first)).toBeNull()

    // The second set changes one drive cell by +50 N·m and keeps the regen revision.
    const values = GENTLE.values.map((r) => [...r])
    values[1][1] += 50
    const drive2 = await saveRevision(s, s.mapId, 1, { ...GENTLE, values })
    await approve(s, drive2)
    const second = await makeSet(s, { driveRevisionId: drive2 })
    const cmp = await releaseOf(s, second)
    expect(cmp?.before.setId).toBe(first)
    const drive = cmp!.parts.find((p) => p.kind === 'drive')!
    expect(drive.change).toBe('changed')
    if (drive.change !== 'changed') return
    expect(drive.diff.changed.length).toBe(1)
    expect(drive.diff.largestAbsolute?.delta).toBe(50)
    expect(drive.before.number).toBe(1)
    expect(drive.number).toBe(2)
    expect(cmp!.parts.find((p) => p.kind === 'regen')).toMatchObject({ change: 'same', number: 1 })
  })

  it('skips a release withdrawn before the later one was made, unless no other came before', async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const a = await makeSet(s)
    await releaseOf(s, a)
    const regen2 = await saveRevision(s, s.regenMapId, 1, { ...GENTLE_REGEN, values: [[0, 30, 30], [0, 60, 60], [0, 100, 100]] })
    await approve(s, regen2)
    const b = await makeSet(s, { regenRevisionId: regen2 })
    expect((await releaseOf(s, b))?.before).toMatchObject({ setId: a, withdrawnAt: null })
    // B withdrawn: A is back in the trucks. C then follows A, not the withdrawn B.
    expect((await withdrawSet(b, s.leadCookie, 'Lift-off too sharp')).status).toBe(200)
    const regen3 = await saveRevision(s, s.regenMapId, 2, { ...GENTLE_REGEN, values: [[0, 25, 25], [0, 60, 60], [0, 100, 100]] })
    await approve(s, regen3)
    const c = await makeSet(s, { regenRevisionId: regen3 })
    expect((await releaseOf(s, c))?.before.setId).toBe(a)
  })

  it('after a withdrawn first release, the next compares with it and says it was withdrawn', async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const a = await makeSet(s)
    await releaseOf(s, a)
    expect((await withdrawSet(a, s.leadCookie, 'Spin at launch')).status).toBe(200)
    // Both withdrawn revisions are replaced by new ones (a withdrawn revision is never released again).
    const values = GENTLE.values.map((r) => [...r])
    values[2][2] -= 10
    const drive2 = await saveRevision(s, s.mapId, 1, { ...GENTLE, values })
    const regen2 = await saveRevision(s, s.regenMapId, 1, { ...GENTLE_REGEN, values: [[0, 30, 30], [0, 60, 60], [0, 100, 100]] })
    await approve(s, drive2)
    await approve(s, regen2)
    const b = await makeSet(s, { driveRevisionId: drive2, regenRevisionId: regen2 })
    const cmp = await releaseOf(s, b)
    expect(cmp?.before.setId).toBe(a)
    expect(cmp?.before.withdrawnAt).toBeInstanceOf(Date)
    expect(cmp?.parts.find((p) => p.kind === 'regen')).toMatchObject({ change: 'changed' })
  })
})

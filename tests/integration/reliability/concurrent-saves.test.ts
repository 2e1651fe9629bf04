// Many people saving one map at once, through the real route handler: the per-map row lock and the
// unique (map, number) index must let exactly one save land on each parent, answer the others with
// 409 (never a 500), and keep the history contiguous. Runs on PGlite and again on PostgreSQL.
import { describe, expect, it } from 'vitest'
import { asc, eq } from 'drizzle-orm'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import { getDb } from '@/db/client'
import { mapRevisions, revisionEvents } from '@/db/schema'
import { checksum } from '@/db/checksum'
import type { MapTable } from '@/maps'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { programAndMap, SMALL_DRIVE, withCell } from '@/tests/support/fixtures'
import { act, reviewSetup } from '@/tests/support/review-fixtures'

const SAVES = 50

/** Cookies of several editors: calibration engineers and leads, as on a busy day. */
async function editors(n: number): Promise<string[]> {
  const users = await Promise.all(Array.from({ length: n }, (_, i) => makeUser(i % 3 === 2 ? 'lead_engineer' : 'calibration_engineer')))
  return Promise.all(users.map(sessionCookie))
}

/** A table distinct per save, so each stored revision is recognisable by its checksum. */
const tableFor = (i: number): MapTable => withCell(SMALL_DRIVE, 1, 1, 1000 + i)

function save(mapId: number, cookie: string, parentNumber: number, i: number) {
  return call(revisionsRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber, message: `save ${i}`, table: tableFor(i) } })
}

async function history(mapId: number) {
  const db = await getDb()
  return db.select({ number: mapRevisions.number, message: mapRevisions.message, checksum: mapRevisions.checksum }).from(mapRevisions).where(eq(mapRevisions.mapId, mapId)).orderBy(asc(mapRevisions.number))
}

describe('concurrent saves on one map', () => {
  it(`${SAVES} saves at once on the same parent, three rounds: exactly one lands per round, the rest get 409`, async () => {
    const { mapId } = await programAndMap()
    const cookies = await editors(6)
    let latest = 1
    for (let round = 0; round < 3; round++) {
      const results = await Promise.all(Array.from({ length: SAVES }, (_, i) => save(mapId, cookies[i % cookies.length], latest, round * SAVES + i)))
      const statuses = results.map((r) => r.status)
      expect(statuses.filter((s) => s >= 500)).toEqual([])
      expect(statuses.filter((s) => s === 201)).toHaveLength(1)
      expect(statuses.filter((s) => s === 409)).toHaveLength(SAVES - 1)
      const winner = results.findIndex((r) => r.status === 201)
      expect(results[winner].body.revision.number).toBe(latest + 1)
      for (const r of results.filter((x) => x.status === 409)) expect(r.body.error.details.parentNumber).toBe(latest)
      const stored = (await history(mapId)).find((h) => h.number === latest + 1)
      expect(stored).toEqual({ number: latest + 1, message: `save ${round * SAVES + winner}`, checksum: checksum(tableFor(round * SAVES + winner)) })
      latest += 1
    }
    expect((await history(mapId)).map((h) => h.number)).toEqual([1, 2, 3, 4])
    console.log(`concurrent saves: 3 rounds × ${SAVES}: 1 × 201 and ${SAVES - 1} × 409 each round`)
  }, 60_000)

  it(`${SAVES} saves at once, each retrying on 409 on top of the newer revision: all land, numbers 1..${SAVES + 1}`, async () => {
    const { mapId } = await programAndMap()
    const cookies = await editors(6)
    const MAX_TRIES = SAVES + 10 // with n contenders the unluckiest loses at most n − 1 times
    const outcomes = await Promise.all(
      Array.from({ length: SAVES }, async (_, i) => {
        let parent = 1
        const statuses: number[] = []
        for (let attempt = 0; attempt < MAX_TRIES; attempt++) {
          const r = await save(mapId, cookies[i % cookies.length], parent, i)
          statuses.push(r.status)
          if (r.status === 201) return { i, statuses, number: r.body.revision.number as number, checksum: r.body.revision.checksum as string }
          if (r.status !== 409) return { i, statuses, number: null, checksum: null }
          parent = r.body.error.details.latestNumber
        }
        return { i, statuses, number: null, checksum: null }
      }),
    )
    const all = outcomes.flatMap((o) => o.statuses)
    expect(all.filter((s) => s !== 201 && s !== 409)).toEqual([])
    expect(outcomes.filter((o) => o.number === null)).toEqual([])
    const rows = await history(mapId)
    expect(rows.map((r) => r.number)).toEqual(Array.from({ length: SAVES + 1 }, (_, k) => k + 1))
    for (const o of outcomes) expect(rows.find((r) => r.number === o.number)).toEqual({ number: o.number, message: `save ${o.i}`, checksum: checksum(tableFor(o.i)) })
    expect(new Set(outcomes.map((o) => o.number)).size).toBe(SAVES)
    console.log(`concurrent saves with retry: ${SAVES} landed as revisions 2..${SAVES + 1} after ${all.length} attempts (${all.filter((s) => s === 409).length} × 409, max ${Math.max(...outcomes.map((o) => o.statuses.length))} tries for one save)`)
  }, 120_000)
})

describe('concurrent approvals', () => {
  it('two leads approving the same submitted revision at once: one 200, one 409, one approval recorded (five times over)', async () => {
    for (let k = 0; k < 5; k++) {
      const s = await reviewSetup()
      expect((await act(s.revisionId, s.cookie, 'submit')).status).toBe(200)
      const other = await sessionCookie(await makeUser('lead_engineer'))
      const [a, b] = await Promise.all([act(s.revisionId, s.leadCookie, 'approve'), act(s.revisionId, other, 'approve')])
      expect([a.status, b.status].sort()).toEqual([200, 409])
      const db = await getDb()
      const events = await db.select({ action: revisionEvents.action }).from(revisionEvents).where(eq(revisionEvents.revisionId, s.revisionId))
      expect(events.map((e) => e.action).sort()).toEqual(['approve', 'submit'])
    }
  }, 60_000)

  it('six leads approving at once: exactly one wins', async () => {
    const s = await reviewSetup()
    await act(s.revisionId, s.cookie, 'submit')
    const leads = await Promise.all(Array.from({ length: 5 }, async () => sessionCookie(await makeUser('lead_engineer'))))
    const results = await Promise.all([s.leadCookie, ...leads].map((c) => act(s.revisionId, c, 'approve')))
    const statuses = results.map((r) => r.status).sort()
    expect(statuses).toEqual([200, 409, 409, 409, 409, 409])
    console.log(`concurrent approvals: ${JSON.stringify(statuses)}`)
  }, 60_000)
})

// The map read's answers are kept until the database changes (db/snapshot-cache.ts). What matters:
// a read after any write — through the app, through raw SQL, from another connection — answers the
// new state; a read with nothing written in between is a hit; a write racing a read never leaves an
// old answer looking current. Runs on PGlite and, in the PostgreSQL pass, on PostgreSQL.
import { describe, expect, it } from 'vitest'
import { sql } from 'drizzle-orm'
import * as mapRoute from '@/app/api/maps/[id]/route'
import { mapReadBody, mapReads } from '@/app/_lib/maps/map-read-json'
import { getDb, getHandle } from '@/db/client'
import { tablesWithoutChangeTrigger } from '@/db/change-feed'
import { maps } from '@/db/schema'
import { eq } from 'drizzle-orm'
import { readMapWithLatest } from '@/db/queries/maps'
import { getProgram, updateProgram } from '@/db/queries/programs'
import { getRevision } from '@/db/queries/revisions'
import { transitionRevision } from '@/db/queries/review'
import { updateUser } from '@/db/queries/users'
import { claimNextLog } from '@/db/queries/logs'
import { currentSnapshot, SnapshotCache } from '@/db/snapshot-cache'
import { call, sessionCookie } from '@/tests/support/api'
import { tipperWithMaps } from '../physics-api/fixtures'

async function readMap(id: string) {
  const body = await mapReadBody(Number(id))
  return body && JSON.parse(body)
}

/** Counts the cache's hits and misses over `f`. */
async function counted<T>(f: () => Promise<T>) {
  const [h, m] = [mapReads.hits, mapReads.misses]
  const value = await f()
  return { value, hits: mapReads.hits - h, misses: mapReads.misses - m }
}

/** Runs SQL on a connection of its own: a second pool on PostgreSQL (as another server would), the raw client on PGlite (its one session). */
async function writeElsewhere(text: string) {
  if (process.env.DATABASE_URL) {
    const { Client } = await import('pg')
    const c = new Client({ connectionString: process.env.DATABASE_URL })
    await c.connect()
    try {
      await c.query(text)
    } finally {
      await c.end()
    }
  } else {
    const db = (await getDb()) as unknown as { $client: { exec: (s: string) => Promise<unknown> } }
    await db.$client.exec(text)
  }
}

describe('map read kept until the database changes', () => {
  it('answers a repeated read from the cache, with the same text as the first read', async () => {
    const { author, driveId } = await tipperWithMaps()
    const first = await counted(() => mapReadBody(Number(driveId)))
    const second = await counted(() => mapReadBody(Number(driveId)))
    expect(second).toMatchObject({ hits: 1, misses: 0 })
    expect(second.value).toBe(first.value)
    const cookie = await sessionCookie(author)
    const viaRoute = await call(mapRoute.GET, { cookie, params: { id: driveId } })
    expect(viaRoute.body).toEqual(JSON.parse(first.value!))
  })

  it('answers the new state after every kind of change that shows in the read', async () => {
    const { author, program, driveId } = await tipperWithMaps()
    const db = await getDb()
    const id = Number(driveId)
    await readMap(driveId)

    // The map itself, written by raw SQL: nothing in the app had to be told.
    await db.execute(sql`update maps set description = 'Written behind the app' where id = ${id}`)
    expect((await readMap(driveId)).map.description).toBe('Written behind the app')

    // The program's parameters: new findings and a new parameter version.
    const p = (await getProgram(program.id))!
    const before = await readMap(driveId)
    await updateProgram(program.id, { name: p.name, description: p.description, params: { ...p.params, motorPeakTorqueNm: p.params.motorPeakTorqueNm / 10 }, releaseConditions: p.releaseConditions, reason: 'weaker motor' }, author.id)
    const weaker = await readMap(driveId)
    expect(weaker.map.programParamVersion).toBe(before.map.programParamVersion + 1)
    expect(weaker.findings).not.toEqual(before.findings)

    // The revision's review state and its author's name.
    const rev = (await getRevision(id))!
    expect(await transitionRevision({ revisionId: rev.id, actorId: author.id, action: 'submit', from: 'draft', to: 'in_review', comment: '' })).toEqual({ ok: true })
    expect((await readMap(driveId)).latest.state).toBe('in_review')
    await updateUser(author.id, { name: 'Renamed Engineer' })
    expect((await readMap(driveId)).latest.authorName).toBe('Renamed Engineer')

    // A new revision moves the latest pointer.
    const cookie = await sessionCookie(author)
    const table = weaker.latest.table
    const values = table.values.map((row: number[], r: number) => row.map((v, c) => (r === 1 && c === 1 ? v + 1 : v)))
    const saved = await call((await import('@/app/api/maps/[id]/revisions/route')).POST, { method: 'POST', cookie, params: { id: driveId }, body: { parentNumber: 1, message: 'one cell', notes: '', table: { ...table, values } } })
    expect(saved.status).toBe(201)
    const after = await readMap(driveId)
    expect(after.latest.number).toBe(2)
    expect(after.latest.table.values[1][1]).toBe(values[1][1])
  })

  it('sees a write made on another connection, as a second server would make it', async () => {
    const { driveId } = await tipperWithMaps()
    await readMap(driveId)
    await readMap(driveId) // now a hit
    await writeElsewhere(`update maps set name = 'Renamed elsewhere' where id = ${Number(driveId)}`)
    const { value, misses } = await counted(() => readMap(driveId))
    expect(misses).toBe(1)
    expect(value.map.name).toBe('Renamed elsewhere')
  })

  it('never keeps an answer under a snapshot newer than the one its query saw, when a write lands before it is stored', async () => {
    const { driveId } = await tipperWithMaps()
    const db = await getDb()
    const cache = new SnapshotCache<string, string>('race-test', 4)
    let reads = 0
    const read = async () => {
      const seen = await currentSnapshot() // the read's own query
      reads++
      if (reads === 1) await db.execute(sql`update maps set description = 'Raced' where id = ${Number(driveId)}`)
      return { snapshot: seen, value: `read ${reads}` }
    }
    expect(await cache.get('k', read)).toBe('read 1')
    expect(await cache.get('k', read)).toBe('read 2') // the write made the kept answer old
    expect(await cache.get('k', read)).toBe('read 2') // nothing written since
  })

  it('keeps the map read under the snapshot of its own query', async () => {
    const { driveId } = await tipperWithMaps()
    const read = (await readMapWithLatest(Number(driveId)))!
    expect(read.snapshot).toBe(await currentSnapshot())
    expect(read.value.map.id).toBe(Number(driveId))
    expect(await readMapWithLatest(987_654)).toBeNull()
  })

  it('gives 404 for a map that does not exist, and a deleted map is gone from the next read', async () => {
    const { author, driveId } = await tipperWithMaps()
    const cookie = await sessionCookie(author)
    expect((await call(mapRoute.GET, { cookie, params: { id: '987654' } })).status).toBe(404)
    await readMap(driveId)
    await writeElsewhere(`delete from map_revisions where map_id = ${Number(driveId)}; delete from maps where id = ${Number(driveId)}`)
    expect((await call(mapRoute.GET, { cookie, params: { id: driveId } })).status).toBe(404)
  })
})

// TEST_DATABASE_URL, not DATABASE_URL: the setup sets DATABASE_URL in beforeAll, after this file's tests are collected.
const onPglite = !process.env.TEST_DATABASE_URL

describe.runIf(onPglite)('PGlite change feed', () => {
  it('puts its trigger on every table of the schema', async () => {
    const h = await getHandle()
    expect(await tablesWithoutChangeTrigger((h.db as unknown as { $client: Parameters<typeof tablesWithoutChangeTrigger>[0] }).$client)).toEqual([])
  })

  it('counts a committed write by the time the writer has its answer, whichever way it was written; not a read, a write of no row or a rollback', async () => {
    const { driveId } = await tipperWithMaps()
    const h = await getHandle()
    const db = h.db
    const raw = (db as unknown as { $client: { exec: (s: string) => Promise<unknown>; query: (s: string) => Promise<unknown> } }).$client
    const count = () => h.changes!.count
    const id = Number(driveId)
    const writes: [string, () => Promise<unknown>][] = [
      ['query builder', () => db.update(maps).set({ description: 'a' }).where(eq(maps.id, id))],
      ['transaction', () => db.transaction(async (tx) => { await tx.update(maps).set({ description: 'b' }).where(eq(maps.id, id)) })],
      ['raw exec', () => raw.exec(`update maps set description = 'c' where id = ${id}`)],
      ['raw query', () => raw.query(`update maps set description = 'd' where id = ${id}`)],
    ]
    for (const [how, write] of writes) {
      const before = count()
      await write()
      expect(count(), how).toBeGreaterThan(before)
    }
    const before = count()
    await db.select().from(maps).where(eq(maps.id, id))
    await currentSnapshot()
    await db.update(maps).set({ description: 'e' }).where(eq(maps.id, -1)) // changes no row
    await db.transaction(async (tx) => { await tx.update(maps).set({ description: 'rolled back' }).where(eq(maps.id, id)); tx.rollback() }).catch(() => {})
    await Promise.resolve()
    expect(count()).toBe(before)
  })

  it('answers a repeated map read with no query at all, and asks for the snapshot once after a write', async () => {
    const { driveId } = await tipperWithMaps()
    await readMap(driveId)
    const [checks, misses] = [mapReads.checks, mapReads.misses]
    for (let i = 0; i < 5; i++) await readMap(driveId)
    expect([mapReads.checks - checks, mapReads.misses - misses]).toEqual([0, 0])
    await (await getDb()).execute(sql`update users set name = name where id = ${(await tipperWithMaps()).author.id}`) // a write the read does not show
    await readMap(driveId)
    await readMap(driveId)
    expect(mapReads.checks - checks).toBe(1)
  })
})

describe.runIf(!onPglite)('on PostgreSQL', () => {
  it('asks for the snapshot on every repeated read: other servers write without telling this one', async () => {
    const { driveId } = await tipperWithMaps()
    expect((await getHandle()).changes).toBeUndefined()
    await readMap(driveId)
    const [checks, hits] = [mapReads.checks, mapReads.hits]
    for (let i = 0; i < 3; i++) await readMap(driveId)
    expect([mapReads.checks - checks, mapReads.hits - hits]).toEqual([3, 3])
  })
})

describe('database snapshot', () => {
  it('stays the same across reads and an idle log-worker poll, and moves on a write', async () => {
    const s0 = await currentSnapshot()
    await readMap((await tipperWithMaps()).driveId) // writes: the fixture creates rows
    const s1 = await currentSnapshot()
    expect(s1).not.toBe(s0)
    await readMap('1')
    expect(await claimNextLog('idle#1', 60_000, 3)).toBeNull() // nothing waits: the poll locks and changes no row
    expect(await currentSnapshot()).toBe(s1)
    await (await getDb()).execute(sql`update maps set description = description`)
    expect(await currentSnapshot()).not.toBe(s1)
  })

  it('keeps at most its bound of entries, dropping the least recently used', async () => {
    const cache = new SnapshotCache<number, string>('bounded-test', 2)
    const snapshot = await currentSnapshot()
    let reads = 0
    const read = (k: number) => cache.get(k, async () => (reads++, { snapshot, value: `v${k}` }))
    await read(1); await read(2); await read(1); await read(3) // 2 is the least recently used
    expect(reads).toBe(3)
    await read(1); await read(3)
    expect(reads).toBe(3)
    await read(2)
    expect(reads).toBe(4)
  })
})

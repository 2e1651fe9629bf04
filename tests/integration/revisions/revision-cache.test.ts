// Reads of immutable revision content through the caches: the table by revision id, findings
// beside it, and the session route used as the API benchmark's ceiling.
import { describe, expect, it } from 'vitest'
import * as mapRoute from '@/app/api/maps/[id]/route'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import * as sessionRoute from '@/app/api/session/route'
import { REVISION_TABLE_CACHE_SIZE, revisionTable, revisionTableCached } from '@/db/queries/revision-tables'
import { getProgram, updateProgram } from '@/db/queries/programs'
import { getMapWithLatest } from '@/db/queries/maps'
import { revisionFindings } from '@/app/_lib/maps/revision-findings'
import { validate, limitsFromVehicle } from '@/maps'
import { getDb, getHandle } from '@/db/client'
import { executePrepared } from '@/db/prepared'
import { sql } from 'drizzle-orm'
import { call, sessionCookie } from '@/tests/support/api'
import { tipperWithMaps } from '../physics-api/fixtures'

describe('revision content cache', () => {
  it('serves a map read with the same table and findings as a fresh read, and the latest pointer moves on a save', async () => {
    const { author, driveId } = await tipperWithMaps()
    const cookie = await sessionCookie(author)
    const first = await call(mapRoute.GET, { cookie, params: { id: driveId } })
    expect(first.status).toBe(200)
    expect(await revisionTableCached(first.body.latest.id)).toBe(true)
    const again = await call(mapRoute.GET, { cookie, params: { id: driveId } })
    expect(again.body).toEqual(first.body)
    const table = first.body.latest.table
    const values = table.values.map((row: number[], r: number) => row.map((v, c) => (r === 1 && c === 1 ? v + 1 : v)))
    const saved = await call(revisionsRoute.POST, { method: 'POST', cookie, params: { id: driveId }, body: { parentNumber: 1, message: 'one cell', notes: '', table: { ...table, values } } })
    expect(saved.status).toBe(201)
    const after = await call(mapRoute.GET, { cookie, params: { id: driveId } })
    expect(after.body.latest.number).toBe(2)
    expect(after.body.latest.table.values[1][1]).toBe(values[1][1])
  })

  it('judges with the program parameters of the moment: a new parameter version changes the findings of a cached table', async () => {
    const { author, program, driveId } = await tipperWithMaps()
    const cookie = await sessionCookie(author)
    const before = await call(mapRoute.GET, { cookie, params: { id: driveId } })
    const p = (await getProgram(program.id))!
    // A motor a tenth as strong: the demo drive map now asks for more torque than the motor has.
    const weaker = { ...p.params, motorPeakTorqueNm: p.params.motorPeakTorqueNm / 10 }
    await updateProgram(program.id, { name: p.name, description: p.description, params: weaker, releaseConditions: p.releaseConditions, reason: 'weaker motor' }, author.id)
    const after = await call(mapRoute.GET, { cookie, params: { id: driveId } })
    expect(after.body.findings).toEqual(validate(after.body.latest.table, limitsFromVehicle(weaker)))
    expect(after.body.findings).not.toEqual(before.body.findings)
  })

  it('writes the answer text exactly as serialising the whole read would, table and findings spliced in', async () => {
    const { author, driveId } = await tipperWithMaps()
    const cookie = await sessionCookie(author)
    const read = () => mapRoute.GET(new Request('http://127.0.0.1:3000/api/maps', { headers: { cookie } }), { params: Promise.resolve({ id: String(driveId) }) })
    const found = (await getMapWithLatest(Number(driveId)))!
    const whole = JSON.stringify({ map: found.map, latest: found.latest, findings: revisionFindings(found.latest.table, found.map.programParams) })
    const first = await read()
    expect(first.headers.get('content-type')).toBe('application/json')
    expect(await first.text()).toBe(whole)
    expect(await (await read()).text()).toBe(whole) // the second read splices the cached texts
  })

  it('hands out frozen tables, so no caller can change what the next one reads', async () => {
    const { driveId, author } = await tipperWithMaps()
    const cookie = await sessionCookie(author)
    const { body } = await call(mapRoute.GET, { cookie, params: { id: driveId } })
    const t = (await revisionTable(body.latest.id))!
    expect(() => { (t.values[0] as number[])[0] = -1 }).toThrow(TypeError)
    expect(await revisionTable(999_999)).toBeNull()
    expect(REVISION_TABLE_CACHE_SIZE).toBeGreaterThan(0)
  })
})

describe('GET /api/session', () => {
  it('answers the signed-in user id, name and role, and 401 without a session', async () => {
    const { author } = await tipperWithMaps()
    const ok = await call(sessionRoute.GET, { cookie: await sessionCookie(author) })
    expect(ok).toEqual({ status: 200, body: { user: { id: author.id, name: author.name, role: 'calibration_engineer' } } })
    expect((await call(sessionRoute.GET)).status).toBe(401)
  })
})

describe('prepared statements', () => {
  it('uses a statement another module copy already prepared in the same session (Next loads routes and pages apart)', async () => {
    const db = await getDb()
    // PGlite is one session that every module copy shares: another copy may have prepared the name already.
    // On PostgreSQL node-postgres prepares per pooled connection and keeps track itself (a raw PREPARE here
    // would sit on one connection of the pool behind its back), so there the two calls below are the test.
    if ((await getHandle()).kind === 'pglite') await db.execute(sql.raw('prepare twice_prepared (bigint) as select $1::int + 1 as n'))
    expect(await executePrepared('twice_prepared', 'select $1::int + 1 as n', [41])).toEqual([{ n: 42 }])
    expect(await executePrepared('twice_prepared', 'select $1::int + 1 as n', [1])).toEqual([{ n: 2 }])
  })

  it('gives rows with the same values and types as an ordinary query (PGlite runs EXECUTE through its simple protocol)', async () => {
    // Against the same driver's own ordinary query (drizzle's execute keeps timestamps as text on PGlite).
    const client = ((await getHandle()).db as unknown as { $client: { query: (q: string) => Promise<{ rows: unknown[] }> } }).$client
    const text = `select $1::int as n, $1::bigint as big, timestamptz '2026-01-02 03:04:05+00' as t, '{"a":[1,null]}'::jsonb as j,
      null::int as z, 'x''y'::text as s, true as b, 2.5::float8 as f, 1.25::numeric as dec, array[1,2]::int[] as arr`
    const prepared = await executePrepared('typed_row', text, [7])
    expect(prepared).toEqual((await client.query(text.replaceAll('$1', '7'))).rows)
    expect(prepared[0].t).toBeInstanceOf(Date)
    expect(prepared[0].j).toEqual({ a: [1, null] })
  })

  it('refuses arguments that are not integers and names that are not plain words', async () => {
    await expect(executePrepared('some_name', 'select $1', [1.5])).rejects.toThrow(/arguments must be integers, got 1.5/)
    await expect(executePrepared('x; drop table maps', 'select 1', [])).rejects.toThrow(/lower-case letters and _/)
  })
})

import * as reportsRoute from '@/app/api/reports/route'
import * as mapsRoute from '@/app/api/maps/route'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import { getDb } from '@/db/client'
import { mapSets } from '@/db/schema'
import { latestParamVersion } from '@/db/queries/param-versions'
import { createSet, partsKey } from '@/db/queries/sets'
import { getRevision } from '@/db/queries/revisions'
import type { MapTable } from '@/maps'
import { sql } from 'drizzle-orm'
import { call, makeUser, sessionCookie } from './api'
import { programAndMap, regenMap, SMALL_DRIVE } from './fixtures'

/** A valid report body for a set row id; its one flag is on the set's drive map. */
export function reportBody(setId: number, over: Record<string, unknown> = {}) {
  return {
    setId,
    drivenOn: '2026-11-30',
    vehicleUnit: 'T-07',
    route: 'Proving ground wet circle',
    surface: 'wet-asphalt',
    weather: 'drizzle',
    ambientC: 6,
    loadCase: 'empty',
    payloadKg: 0,
    trailer: false,
    ratings: { launch: 2, tipIn: 3, steadyPedal: 4, liftOffRegen: 3, brakeBlending: 4 },
    comments: 'Rear tandem spun at launch above half pedal.',
    flags: [{ map: 'drive', pedalPct: 50, speedKmh: 0, what: 'wheel spin on launch', severity: 3 }],
    ...over,
  }
}

/**
 * A program with a drive map and a regen map (each at revision 1, made through the API by an
 * engineer) and set 1 of the two with the program's parameter version 1.
 */
export async function programWithSet(drive: MapTable = SMALL_DRIVE, regen: MapTable = regenMap(600)) {
  const ctx = await programAndMap(drive)
  const m = await call(mapsRoute.POST, { method: 'POST', cookie: ctx.cookie, body: { programId: ctx.programId, name: 'Lift-off', kind: 'regen', table: regen, message: 'First cut' } })
  if (m.status !== 201) throw new Error(`fixture regen map not created: ${JSON.stringify(m.body)}`)
  const regenMapId = m.body.mapId as number
  const driveRevisionId = (await getRevision(ctx.mapId, 1))!.id
  const regenRevisionId = (await getRevision(regenMapId, 1))!.id
  const paramVersionId = (await latestParamVersion(ctx.programId))!.id
  const set = await createSet({ programId: ctx.programId, driveRevisionId, regenRevisionId, paramVersionId, note: '', createdBy: ctx.engineer.id })
  return { ...ctx, regenMapId, driveRevisionId, regenRevisionId, paramVersionId, setId: set.id, setNumber: set.number }
}

type SetCtx = Awaited<ReturnType<typeof programWithSet>>

/** A second set of the same program: a new drive revision (saved through the API) with the same regen revision. */
export async function nextDriveSet(ctx: SetCtx, table: MapTable = { ...SMALL_DRIVE, values: SMALL_DRIVE.values.map((r) => r.map((v) => v * 0.8)) }) {
  const latest = (await getRevision(ctx.mapId))!
  const saved = await call(revisionsRoute.POST, { method: 'POST', cookie: ctx.cookie, params: { id: String(ctx.mapId) }, body: { parentNumber: latest.number, message: 'Softer launch', table } })
  if (saved.status !== 201) throw new Error(`fixture revision not saved: ${JSON.stringify(saved.body)}`)
  const set = await createSet({ programId: ctx.programId, driveRevisionId: saved.body.revision.id, regenRevisionId: ctx.regenRevisionId, paramVersionId: ctx.paramVersionId, note: '', createdBy: ctx.engineer.id })
  return { setId: set.id, setNumber: set.number, driveRevisionId: saved.body.revision.id as number }
}

/**
 * A set holding only the drive revision, as the 0006 migration made from data older than sets
 * when the program had no regen map. The app never makes one; written here row by row.
 */
export async function driveOnlySet(ctx: SetCtx) {
  const db = await getDb()
  const parts = { driveRevisionId: ctx.driveRevisionId, regenRevisionId: null, paramVersionId: ctx.paramVersionId }
  const [row] = await db
    .insert(mapSets)
    .values({ programId: ctx.programId, ...parts, partsKey: partsKey(parts), number: sql`(select coalesce(max(${mapSets.number}), 0) + 1 from ${mapSets} where ${mapSets.programId} = ${ctx.programId})` })
    .returning({ id: mapSets.id, number: mapSets.number })
  return { setId: row.id, setNumber: row.number }
}

/** A program with a set, a driver, and a report the driver filed on set 1. */
export async function filedReport(over: Record<string, unknown> = {}) {
  const ctx = await programWithSet()
  const driver = await makeUser('test_driver')
  const driverCookie = await sessionCookie(driver)
  const res = await call(reportsRoute.POST, { method: 'POST', cookie: driverCookie, body: reportBody(ctx.setId, over) })
  if (res.status !== 201) throw new Error(`report fixture: ${JSON.stringify(res.body)}`)
  return { ...ctx, driver, driverCookie, reportId: res.body.report.id as number, report: res.body.report }
}

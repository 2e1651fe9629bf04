// A program with a drive and a regen map, a lead and a driver, and helpers to put revisions
// through review, make sets and file reports on them — all through the route handlers.
import * as mapsRoute from '@/app/api/maps/route'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import * as reportsRoute from '@/app/api/reports/route'
import * as setsRoute from '@/app/api/sets/route'
import * as setRoute from '@/app/api/sets/[id]/route'
import * as releaseRoute from '@/app/api/sets/[id]/release/route'
import * as withdrawRoute from '@/app/api/sets/[id]/withdraw/route'
import * as packageRoute from '@/app/api/sets/[id]/package/route'
import type { MapTable } from '@/maps'
import { call, makeUser, sessionCookie } from './api'
import { programAndMap } from './fixtures'
import { act, GENTLE } from './review-fixtures'
import { reportBody } from './report-fixtures'

/** A gentle regen map: little lift-off braking, well inside the tyres on every default surface. */
export const GENTLE_REGEN: MapTable = { kind: 'regen', rowAxis: [0, 50, 100], colAxis: [0, 20, 60], values: [[0, 20, 20], [0, 60, 60], [0, 100, 100]] }

export async function setSetup(opts: { drive?: MapTable; regen?: MapTable } = {}) {
  const ctx = await programAndMap(opts.drive ?? GENTLE)
  const regen = await call(mapsRoute.POST, { method: 'POST', cookie: ctx.cookie, body: { programId: ctx.programId, name: 'Lift-off', kind: 'regen', table: opts.regen ?? GENTLE_REGEN, message: 'First cut' } })
  if (regen.status !== 201) throw new Error(`fixture regen map: ${JSON.stringify(regen.body)}`)
  const revs = async (mapId: number) => (await call(revisionsRoute.GET, { cookie: ctx.cookie, params: { id: String(mapId) } })).body.revisions as { id: number; number: number }[]
  const driveRevisionId = (await revs(ctx.mapId))[0].id
  const regenRevisionId = (await revs(regen.body.mapId))[0].id
  const lead = await makeUser('lead_engineer')
  const leadCookie = await sessionCookie(lead)
  const driver = await makeUser('test_driver')
  const driverCookie = await sessionCookie(driver)
  return { ...ctx, regenMapId: regen.body.mapId as number, driveRevisionId, regenRevisionId, lead, leadCookie, driver, driverCookie }
}

export type SetCtx = Awaited<ReturnType<typeof setSetup>>

/** Save a further revision of a map (parent = its latest) and return its row id. */
export async function saveRevision(s: SetCtx, mapId: number, parentNumber: number, table: MapTable, message = 'Next cut') {
  const res = await call(revisionsRoute.POST, { method: 'POST', cookie: s.cookie, params: { id: String(mapId) }, body: { parentNumber, message, table } })
  if (res.status !== 201) throw new Error(`fixture revision: ${JSON.stringify(res.body)}`)
  return res.body.revision.id as number
}

/** Submit (as the engineer) and approve (as the lead). */
export async function approve(s: SetCtx, revisionId: number) {
  for (const [cookie, action] of [[s.cookie, 'submit'], [s.leadCookie, 'approve']] as const) {
    const r = await act(revisionId, cookie, action)
    if (r.status !== 200) throw new Error(`fixture ${action}: ${JSON.stringify(r.body)}`)
  }
}

export async function makeSet(s: SetCtx, over: Record<string, unknown> = {}) {
  const res = await call(setsRoute.POST, { method: 'POST', cookie: s.cookie, body: { driveRevisionId: s.driveRevisionId, regenRevisionId: s.regenRevisionId, ...over } })
  if (res.status !== 201 && res.status !== 200) throw new Error(`fixture set: ${JSON.stringify(res.body)}`)
  return res.body.set.id as number
}

/** A valid drive report body on a set: the shared one, with no flagged point unless asked. */
export const setReportBody = (setId: number, over: Record<string, unknown> = {}) => reportBody(setId, { comments: 'Clean launch and lift-off.', flags: [], ...over })

export async function fileSetReport(setId: number, driverCookie: string, over: Record<string, unknown> = {}) {
  const res = await call(reportsRoute.POST, { method: 'POST', cookie: driverCookie, body: setReportBody(setId, over) })
  if (res.status !== 201) throw new Error(`fixture report: ${JSON.stringify(res.body)}`)
  return res.body.report.id as number
}

/**
 * One clean report per release condition of the set (each declared surface × load case), so the gate's coverage
 * condition is met; returns the report ids in the order of the gate's coverage grid.
 */
export async function fileCoveringReports(setId: number, driverCookie: string, over: Record<string, unknown> = {}) {
  const view = await getSetView(setId, driverCookie)
  if (view.status !== 200) throw new Error(`fixture set view: ${JSON.stringify(view.body)}`)
  const ids: number[] = []
  for (const c of view.body.gate.coverage as { surface: string; loadCase: string }[])
    ids.push(await fileSetReport(setId, driverCookie, { surface: c.surface, loadCase: c.loadCase, payloadKg: c.loadCase === 'empty' ? 0 : 18_000, ...over }))
  return ids
}

export const getSetView = (id: number, cookie: string) => call(setRoute.GET, { cookie, params: { id: String(id) } })
export const releaseSet = (id: number, cookie: string, acknowledgements: { key: string; reason: string }[] = []) => call(releaseRoute.POST, { method: 'POST', cookie, params: { id: String(id) }, body: { acknowledgements } })
export const withdrawSet = (id: number, cookie: string, reason: string) => call(withdrawRoute.POST, { method: 'POST', cookie, params: { id: String(id) }, body: { reason } })

/** Download a set's package as raw bytes (the route answers a zip, not JSON). */
export async function downloadPackage(id: number, cookie: string, kind: 'release' | 'test' = 'release') {
  const res = await packageRoute.GET(new Request(`http://127.0.0.1/api/sets/${id}/package?kind=${kind}`, { headers: { cookie } }), { params: Promise.resolve({ id: String(id) }) })
  return { status: res.status, headers: res.headers, bytes: new Uint8Array(await res.arrayBuffer()) }
}

/** Gate conditions by id → met. */
export function gateMet(view: { body: { gate: { conditions: { id: string; met: boolean }[] } } }): Record<string, boolean> {
  return Object.fromEntries(view.body.gate.conditions.map((c) => [c.id, c.met]))
}

import * as reportsRoute from '@/app/api/reports/route'
import { getRevision } from '@/db/queries/revisions'
import { call, makeUser, sessionCookie } from './api'
import { programAndMap } from './fixtures'

/** A valid report body for a revision row id. */
export function reportBody(revisionId: number, over: Record<string, unknown> = {}) {
  return {
    revisionId,
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
    flags: [{ pedalPct: 50, speedKmh: 0, what: 'wheel spin on launch', severity: 3 }],
    ...over,
  }
}

/** A map, a driver, and a filed report on the map's first revision. */
export async function filedReport(over: Record<string, unknown> = {}) {
  const ctx = await programAndMap()
  const rev = await getRevision(ctx.mapId, 1)
  const driver = await makeUser('test_driver')
  const driverCookie = await sessionCookie(driver)
  const res = await call(reportsRoute.POST, { method: 'POST', cookie: driverCookie, body: reportBody(rev!.id, over) })
  if (res.status !== 201) throw new Error(`report fixture: ${JSON.stringify(res.body)}`)
  return { ...ctx, revisionId: rev!.id, driver, driverCookie, reportId: res.body.report.id as number, report: res.body.report }
}

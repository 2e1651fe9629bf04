import fs from 'node:fs'
import * as actionsRoute from '@/app/api/revisions/[revisionId]/actions/route'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import { getRevision } from '@/db/queries/revisions'
import { deliverPending } from '@/app/_lib/mail/sender'
import type { MapTable } from '@/maps'
import { call, makeUser, sessionCookie } from './api'
import { programAndMap, SMALL_DRIVE } from './fixtures'

/** A gentle table that passes the traction check on every surface of the default release conditions. */
export const GENTLE: MapTable = { ...SMALL_DRIVE, values: [[20, 0, 0], [60, 50, 40], [120, 100, 80]] }

export async function act(revisionId: number, cookie: string, action: string, extra: Record<string, unknown> = {}) {
  return call(actionsRoute.POST, { method: 'POST', cookie, params: { revisionId: String(revisionId) }, body: { action, ...extra } })
}

/** An engineer's map with a gentle second revision, a lead, and a driver. */
export async function reviewSetup(table: MapTable = GENTLE) {
  const ctx = await programAndMap()
  const saved = await call(revisionsRoute.POST, { method: 'POST', cookie: ctx.cookie, params: { id: String(ctx.mapId) }, body: { parentNumber: 1, message: 'Gentle launch', table } })
  const revisionId = saved.body.revision.id as number
  const lead = await makeUser('lead_engineer')
  const leadCookie = await sessionCookie(lead)
  const driver = await makeUser('test_driver')
  const driverCookie = await sessionCookie(driver)
  return { ...ctx, revisionId, lead, leadCookie, driver, driverCookie }
}

export async function stateOf(mapId: number, number: number) {
  return (await getRevision(mapId, number))?.state
}

/** Deliver queued mail now and return what the capture server has received so far. */
export async function capturedMail(): Promise<{ to: string[]; raw: string }[]> {
  await deliverPending()
  const file = process.env.MAIL_OUTBOX_FILE
  if (!file || !fs.existsSync(file)) return []
  return fs.readFileSync(file, 'utf8').trim().split('\n').filter(Boolean).map((l) => JSON.parse(l))
}

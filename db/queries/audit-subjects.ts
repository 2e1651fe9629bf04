import { eq, inArray } from 'drizzle-orm'
import { getDb } from '../client'
import { driveReports, maps, mapSets, users, vehiclePrograms } from '../schema'

/** What an audit row is about, as a person would name it, with the page that shows it (if any). */
export interface AuditSubject {
  name: string
  href: string | null
}

const key = (type: string, id: number) => `${type}:${id}`

/**
 * Names for the (entityType, entityId) pairs of some audit rows: one query per kind of thing, so a
 * page of 50 rows costs at most five small queries. A pair whose row is gone is simply absent.
 */
export async function auditSubjects(rows: readonly { entityType: string; entityId: number | null }[]): Promise<Map<string, AuditSubject>> {
  const ids = (type: string) => [...new Set(rows.filter((r) => r.entityType === type && r.entityId !== null).map((r) => r.entityId!))]
  const db = await getDb()
  const out = new Map<string, AuditSubject>()
  const mapIds = ids('map')
  const programIds = ids('vehicle_program')
  const setIds = ids('map_set')
  const reportIds = ids('drive_report')
  const userIds = ids('user')
  await Promise.all([
    mapIds.length &&
      db.select({ id: maps.id, name: maps.name }).from(maps).where(inArray(maps.id, mapIds))
        .then((rs) => rs.forEach((r) => out.set(key('map', r.id), { name: `map ${r.name}`, href: `/maps/${r.id}` }))),
    programIds.length &&
      db.select({ id: vehiclePrograms.id, name: vehiclePrograms.name }).from(vehiclePrograms).where(inArray(vehiclePrograms.id, programIds))
        .then((rs) => rs.forEach((r) => out.set(key('vehicle_program', r.id), { name: `program ${r.name}`, href: `/programs/${r.id}` }))),
    setIds.length &&
      db.select({ id: mapSets.id, number: mapSets.number, program: vehiclePrograms.name }).from(mapSets).innerJoin(vehiclePrograms, eq(vehiclePrograms.id, mapSets.programId)).where(inArray(mapSets.id, setIds))
        .then((rs) => rs.forEach((r) => out.set(key('map_set', r.id), { name: `${r.program} · Set ${r.number}`, href: `/sets/${r.id}` }))),
    reportIds.length &&
      db.select({ id: driveReports.id, drivenOn: driveReports.drivenOn, driver: users.name }).from(driveReports).leftJoin(users, eq(users.id, driveReports.driverId)).where(inArray(driveReports.id, reportIds))
        .then((rs) => rs.forEach((r) => out.set(key('drive_report', r.id), { name: `drive report of ${r.drivenOn}${r.driver ? ` by ${r.driver}` : ''}`, href: `/reports/${r.id}` }))),
    userIds.length &&
      db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, userIds))
        .then((rs) => rs.forEach((r) => out.set(key('user', r.id), { name: `${r.name} (${r.email})`, href: null }))),
  ])
  return out
}

/** The subject of one row from auditSubjects' answer; a plain fallback when it is gone. */
export function subjectOf(subjects: ReadonlyMap<string, AuditSubject>, row: { entityType: string; entityId: number | null }): AuditSubject {
  if (row.entityId === null) return { name: row.entityType.replace(/_/g, ' '), href: null }
  return subjects.get(key(row.entityType, row.entityId)) ?? { name: `${row.entityType.replace(/_/g, ' ')} (no longer there)`, href: null }
}

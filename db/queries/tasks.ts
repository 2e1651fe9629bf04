import { and, desc, eq, isNull, sql } from 'drizzle-orm'
import { getDb } from '../client'
import { driveReports, mapSets, vehiclePrograms } from '../schema'

/** Sets that wait for a test drive: never released, no drive report filed on them yet. */
export async function setsAwaitingDrive() {
  const db = await getDb()
  return db
    .select({ id: mapSets.id, number: mapSets.number, programName: vehiclePrograms.name, note: mapSets.note, createdAt: mapSets.createdAt })
    .from(mapSets)
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, mapSets.programId))
    .leftJoin(driveReports, eq(driveReports.setId, mapSets.id))
    .where(and(isNull(driveReports.id), sql`not exists (select 1 from set_releases sr where sr.set_id = ${mapSets.id})`))
    .orderBy(desc(mapSets.createdAt))
    .limit(50)
}

/** A driver's reports that a lead has not read yet (still editable). */
export async function unreadReportsOf(driverId: number) {
  const db = await getDb()
  return db
    .select({ id: driveReports.id, drivenOn: driveReports.drivenOn, programName: vehiclePrograms.name, setNumber: mapSets.number })
    .from(driveReports)
    .innerJoin(mapSets, eq(mapSets.id, driveReports.setId))
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, mapSets.programId))
    .where(and(eq(driveReports.driverId, driverId), isNull(driveReports.leadReadAt)))
    .orderBy(desc(driveReports.drivenOn))
}

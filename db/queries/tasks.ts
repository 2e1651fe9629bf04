import { and, desc, eq, isNull, sql } from 'drizzle-orm'
import { getDb } from '../client'
import { driveReports, mapSets, vehiclePrograms } from '../schema'

/** Sets under test: never released (so never withdrawn either), newest first, with how many reports they have. */
export async function setsAwaitingDrive() {
  const db = await getDb()
  return db
    .select({
      id: mapSets.id,
      number: mapSets.number,
      programName: vehiclePrograms.name,
      note: mapSets.note,
      createdAt: mapSets.createdAt,
      reports: sql<number>`(select count(*) from drive_reports d where d.set_id = map_sets.id)::int`,
    })
    .from(mapSets)
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, mapSets.programId))
    .where(sql`not exists (select 1 from set_releases sr where sr.set_id = map_sets.id)`)
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

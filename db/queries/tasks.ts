import { and, desc, eq, inArray, isNull } from 'drizzle-orm'
import { getDb } from '../client'
import { driveReports, mapRevisions, maps, vehiclePrograms } from '../schema'

/**
 * Revisions that wait for a test drive: submitted or approved, with no drive report filed on them.
 */
export async function revisionsAwaitingDrive() {
  const db = await getDb()
  return db
    .select({ id: mapRevisions.id, mapId: maps.id, mapName: maps.name, programName: vehiclePrograms.name, number: mapRevisions.number, state: mapRevisions.state })
    .from(mapRevisions)
    .innerJoin(maps, eq(maps.id, mapRevisions.mapId))
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, maps.programId))
    .leftJoin(driveReports, eq(driveReports.revisionId, mapRevisions.id))
    .where(and(inArray(mapRevisions.state, ['in_review', 'approved']), isNull(driveReports.id)))
    .orderBy(desc(mapRevisions.createdAt))
}

/** A driver's reports that a lead has not read yet (still editable). */
export async function unreadReportsOf(driverId: number) {
  const db = await getDb()
  return db
    .select({ id: driveReports.id, drivenOn: driveReports.drivenOn, mapName: maps.name, number: mapRevisions.number })
    .from(driveReports)
    .innerJoin(mapRevisions, eq(mapRevisions.id, driveReports.revisionId))
    .innerJoin(maps, eq(maps.id, mapRevisions.mapId))
    .where(and(eq(driveReports.driverId, driverId), isNull(driveReports.leadReadAt)))
    .orderBy(desc(driveReports.drivenOn))
}

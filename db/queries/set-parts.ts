import { alias } from 'drizzle-orm/pg-core'
import { mapRevisions, maps, mapSets } from '../schema'

/** A set's two revisions and their maps, joined under these names wherever a query names a set's parts. */
export const driveRev = alias(mapRevisions, 'drive_rev')
export const regenRev = alias(mapRevisions, 'regen_rev')
export const driveMap = alias(maps, 'drive_map')
export const regenMap = alias(maps, 'regen_map')

/** Each part's revision id, number, checksum and map (null for a part a set made by migration 0006 lacks). */
export const setPartColumns = {
  driveRevisionId: mapSets.driveRevisionId,
  driveNumber: driveRev.number,
  driveChecksum: driveRev.checksum,
  driveState: driveRev.state,
  driveMapId: driveMap.id,
  driveMapName: driveMap.name,
  regenRevisionId: mapSets.regenRevisionId,
  regenNumber: regenRev.number,
  regenChecksum: regenRev.checksum,
  regenState: regenRev.state,
  regenMapId: regenMap.id,
  regenMapName: regenMap.name,
}


import { and, asc, eq, sql } from 'drizzle-orm'
import type { MapTable } from '../../maps'
import { getDb } from '../client'
import { executePrepared } from '../prepared'
import { SNAPSHOT_SQL, type SnapshotRead } from '../snapshot-cache'
import type { RevisionState } from '../../domain/revision-states'
import type { VehicleParams } from '../../physics/vehicle'
import { mapRevisions, maps, users, vehiclePrograms, type ReleaseConditions } from '../schema'
import { recordAudit } from './audit'
import { insertRevision, revisionSummaryColumns } from './revisions'
import { revisionTable } from './revision-tables'

export interface MapSummary {
  id: number
  name: string
  kind: 'drive' | 'regen'
  description: string
  programId: number
  programName: string
  latestNumber: number | null
  latestAt: Date | null
}

const latest = sql<number | null>`(select max(${mapRevisions.number}) from ${mapRevisions} where ${mapRevisions.mapId} = ${maps.id})`
const latestAt = sql<Date | null>`(select max(${mapRevisions.createdAt}) from ${mapRevisions} where ${mapRevisions.mapId} = ${maps.id})`

/** The latest revision number of the map in the outer query (an index lookup on (map_id, number)). */
const latestNumberOf = sql`(select max(r.number) from map_revisions r where r.map_id = ${maps.id})`

/** A map's own columns with its program's name. */
const mapColumns = {
  id: maps.id,
  name: maps.name,
  kind: maps.kind,
  description: maps.description,
  programId: maps.programId,
  programName: vehiclePrograms.name,
}

/** Everything a page about one map needs of the map and its program. */
const mapWithProgramColumns = {
  ...mapColumns,
  /** The program's latest parameter version: the editor, the map pages and their API judge with it (a set names its own). */
  programParamVersion: sql<number>`(select max(pv.number)::int from param_versions pv where pv.program_id = vehicle_programs.id)`,
  programParams: vehiclePrograms.params,
  programReleaseConditions: vehiclePrograms.releaseConditions,
  createdAt: maps.createdAt,
}

export async function listMaps(filter: { programId?: number } = {}): Promise<MapSummary[]> {
  const db = await getDb()
  const rows = await db
    .select({ ...mapColumns, latestNumber: latest, latestAt })
    .from(maps)
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, maps.programId))
    .where(filter.programId ? eq(maps.programId, filter.programId) : undefined)
    .orderBy(asc(vehiclePrograms.name), asc(maps.kind), asc(maps.name))
  // Drivers return timestamps from raw subqueries as strings; normalise.
  return rows.map((r) => ({ ...r, latestAt: r.latestAt ? new Date(r.latestAt) : null, latestNumber: r.latestNumber === null ? null : Number(r.latestNumber) }))
}

export async function getMap(id: number) {
  const db = await getDb()
  const rows = await db
    .select(mapWithProgramColumns)
    .from(maps)
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, maps.programId))
    .where(eq(maps.id, id))
  return rows[0] ?? null
}

export type MapWithProgram = NonNullable<Awaited<ReturnType<typeof getMap>>>

/** Create a map and its first revision in one transaction. */
export async function createMap(
  input: { programId: number; name: string; kind: 'drive' | 'regen'; description: string; table: MapTable; message: string },
  authorId: number,
) {
  const db = await getDb()
  return db.transaction(async (tx) => {
    const [map] = await tx
      .insert(maps)
      .values({ programId: input.programId, name: input.name, kind: input.kind, description: input.description, createdBy: authorId })
      .returning({ id: maps.id })
    const revision = await insertRevision(tx, { mapId: map.id, number: 1, parentId: null, authorId, message: input.message, notes: '', table: input.table })
    await recordAudit({ actorId: authorId, action: 'map.create', entityType: 'map', entityId: map.id, details: { name: input.name, kind: input.kind } }, tx)
    return { mapId: map.id, revision }
  })
}

/** A revision by its row id, with its table, its map and the map's program, in one round trip. Null when it does not exist. */
export async function getRevisionWithMap(revisionId: number) {
  const db = await getDb()
  const rows = await db
    .select({ map: mapWithProgramColumns, revision: revisionSummaryColumns })
    .from(mapRevisions)
    .innerJoin(maps, eq(maps.id, mapRevisions.mapId))
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, maps.programId))
    .innerJoin(users, eq(users.id, mapRevisions.authorId))
    .where(eq(mapRevisions.id, revisionId))
  return withTable(rows[0])
}

/**
 * Adds the revision's table from the revision-table cache: the row read each time carries only what
 * can change (the map, its program, the revision's state and author name), never the table itself.
 */
async function withTable<T extends { revision: { id: number } }>(row: T | undefined): Promise<(T & { revision: T['revision'] & { table: MapTable } }) | null> {
  if (!row) return null
  const table = await revisionTable(row.revision.id)
  return table && { ...row, revision: { ...row.revision, table } }
}

/** The latest revision of every map, with its table and the program's parameters, in one query (the overview's findings). */
export async function listLatestRevisions() {
  const db = await getDb()
  return db
    .select({ mapId: maps.id, mapName: maps.name, programName: vehiclePrograms.name, programParams: vehiclePrograms.params, number: mapRevisions.number, table: mapRevisions.table })
    .from(maps)
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, maps.programId))
    .innerJoin(mapRevisions, and(eq(mapRevisions.mapId, maps.id), eq(mapRevisions.number, latestNumberOf)))
    .orderBy(asc(vehiclePrograms.name), asc(maps.kind), asc(maps.name))
}

/**
 * The hottest read (every GET of a map, the editor, the compare page): a map, its program and the
 * summary of one revision, as a prepared statement. Column for column what mapWithProgramColumns
 * and revisionSummaryColumns select. Two statements, not one with an optional number: with only the
 * map id as a parameter the server settles on one generic plan after a few runs instead of planning
 * the join again on every read (arguments are integers only).
 */
const mapWithRevisionSql = (revision: string) => `
  select m.id, m.name, m.kind, m.description, m.program_id, p.name as program_name,
    (select max(pv.number)::int from param_versions pv where pv.program_id = p.id) as program_param_version,
    p.params as program_params, p.release_conditions as program_release_conditions, m.created_at,
    r.id as revision_id, r.map_id as revision_map_id, r.number, r.parent_id, r.author_id, u.name as author_name,
    r.message, r.notes, r.checksum, r.state, r.created_at as revision_created_at, ${SNAPSHOT_SQL} as snapshot
  from maps m
  join vehicle_programs p on p.id = m.program_id
  join map_revisions r on r.map_id = m.id and r.number = ${revision}
  join users u on u.id = r.author_id
  where m.id = $1`
const MAP_WITH_LATEST_SQL = mapWithRevisionSql('(select max(x.number) from map_revisions x where x.map_id = m.id)')
const MAP_WITH_REVISION_SQL = mapWithRevisionSql('$2')
const MAP_WITH_TWO_REVISIONS_SQL = mapWithRevisionSql('any(array[$2::int, $3::int])')

type Row = Record<string, unknown>
const date = (v: unknown) => (v instanceof Date ? v : new Date(String(v)))

function mapWithRevisionFromRow(r: Row) {
  return {
    map: {
      id: r.id as number,
      name: r.name as string,
      kind: r.kind as 'drive' | 'regen',
      description: r.description as string,
      programId: r.program_id as number,
      programName: r.program_name as string,
      programParamVersion: r.program_param_version as number,
      programParams: r.program_params as VehicleParams,
      programReleaseConditions: r.program_release_conditions as ReleaseConditions,
      createdAt: date(r.created_at),
    },
    revision: {
      id: r.revision_id as number,
      mapId: r.revision_map_id as number,
      number: r.number as number,
      parentId: r.parent_id as number | null,
      authorId: r.author_id as number,
      authorName: r.author_name as string,
      message: r.message as string,
      notes: r.notes as string,
      checksum: r.checksum as string,
      state: r.state as RevisionState,
      createdAt: date(r.revision_created_at),
    },
  }
}

/**
 * A map, its program and one revision of it (the latest when `number` is omitted) in one round
 * trip, the table from the revision-table cache; null when either is missing.
 */
export async function getMapWithRevision(mapId: number, number?: number) {
  const rows = number === undefined
    ? await executePrepared('map_with_latest', MAP_WITH_LATEST_SQL, [mapId])
    : await executePrepared('map_with_revision', MAP_WITH_REVISION_SQL, [mapId, number])
  return withTable(rows[0] && mapWithRevisionFromRow(rows[0]))
}

/**
 * A map with two of its revisions (a diff on one map) in one round trip: null unless both exist;
 * the two may be the same.
 */
export async function getMapWithRevisionPair(mapId: number, a: number, b: number) {
  const rows = await executePrepared('map_with_two_revisions', MAP_WITH_TWO_REVISIONS_SQL, [mapId, a, b])
  const [ra, rb] = [a, b].map((n) => rows.find((r) => r.number === n))
  if (!ra || !rb) return null
  const [sa, sb] = await Promise.all([withTable(mapWithRevisionFromRow(ra)), withTable(mapWithRevisionFromRow(rb))])
  return sa && sb && { a: sa, b: sb }
}

/**
 * A map, its program and its latest revision in one round trip (the most frequent read). Every map
 * has revision 1 from the moment it exists (createMap writes both in one transaction), so the
 * joins are inner. Null when the map does not exist.
 */
export async function getMapWithLatest(id: number) {
  const read = await readMapWithLatest(id)
  return read && read.value
}

type MapRevisionRow = ReturnType<typeof mapWithRevisionFromRow>
export type MapWithLatest = { map: MapRevisionRow['map']; latest: MapRevisionRow['revision'] & { table: MapTable } }

/** getMapWithLatest with the database snapshot its query saw, for a SnapshotCache. */
export async function readMapWithLatest(id: number): Promise<SnapshotRead<MapWithLatest> | null> {
  const [row] = await executePrepared('map_with_latest', MAP_WITH_LATEST_SQL, [id])
  const found = await withTable(row && mapWithRevisionFromRow(row))
  return found && { snapshot: row.snapshot as string, value: { map: found.map, latest: found.revision } }
}

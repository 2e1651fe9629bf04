import { and, desc, eq, inArray, isNull, or, sql } from 'drizzle-orm'
import { alias } from 'drizzle-orm/pg-core'
import { driveMap, driveRev, regenMap, regenRev, setPartColumns } from './set-parts'
import type { MapKind, MapTable } from '../../maps/table'
import type { RevisionState } from '../../domain/revision-states'
import type { VehicleParams } from '../../physics/vehicle'
import type { RampLimits } from '../../maps/ramps'
import { getDb, type Db } from '../client'
import { driveReports, mapRevisions, maps, mapSets, paramVersions, rampVersions, revisionEvents, setReleases, users, vehiclePrograms, type AcknowledgementRecord, type CoverageWaiverRecord, type ReleaseConditions } from '../schema'
import { recordAudit } from './audit'
import { enqueueMail, type OutgoingMail } from './mail'

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0]

/** The parts key that makes one combination one set (docs/architecture.md). */
export function partsKey(p: { driveRevisionId: number | null; regenRevisionId: number | null; paramVersionId: number; rampVersionId?: number | null }): string {
  // A set without ramps keeps the key it had before ramps were a part.
  return `d${p.driveRevisionId ?? '-'}:r${p.regenRevisionId ?? '-'}:p${p.paramVersionId}${p.rampVersionId ? `:q${p.rampVersionId}` : ''}`
}

export interface SetPart {
  kind: MapKind
  revisionId: number
  number: number
  state: RevisionState
  checksum: string
  message: string
  authorId: number
  authorName: string
  mapId: number
  mapName: string
  table: MapTable
}

export interface SetRelease {
  id: number
  releasedAt: Date
  releasedBy: number
  releasedByName: string
  acknowledgements: AcknowledgementRecord[]
  coverageWaivers: CoverageWaiverRecord[]
  packageKey: string | null
  packageName: string | null
  packageBytes: number | null
  packageSha256: string | null
  manifest: Record<string, unknown> | null
  retiredAt: Date | null
  withdrawnAt: Date | null
  withdrawReason: string | null
}

export type SetStatus = 'testing' | 'released' | 'retired' | 'withdrawn'

export interface MapSetFull {
  id: number
  number: number
  programId: number
  programName: string
  note: string
  createdAt: Date
  createdByName: string | null
  drive: SetPart | null
  regen: SetPart | null
  paramVersion: { id: number; number: number; params: VehicleParams; releaseConditions: ReleaseConditions; reason: string; createdAt: Date }
  /** The ramp limits the set runs with; null for a set made without (the controller keeps its own). */
  rampVersion: { id: number; number: number; limits: RampLimits; reason: string; createdAt: Date } | null
  releases: SetRelease[]
  status: SetStatus
}

/** Where a set stands, from its releases (newest first): the latest decides. */
export function setStatus(releases: Pick<SetRelease, 'retiredAt' | 'withdrawnAt'>[]): SetStatus {
  const r = releases[0]
  if (!r) return 'testing'
  if (r.withdrawnAt) return 'withdrawn'
  if (r.retiredAt) return 'retired'
  return 'released'
}

export const SET_STATUS_LABELS: Readonly<Record<SetStatus, string>> = {
  testing: 'Not released',
  released: 'Released',
  retired: 'Replaced by a later release',
  withdrawn: 'Release withdrawn',
}

const partColumns = {
  revisionId: mapRevisions.id,
  number: mapRevisions.number,
  state: mapRevisions.state,
  checksum: mapRevisions.checksum,
  message: mapRevisions.message,
  authorId: mapRevisions.authorId,
  authorName: users.name,
  mapId: maps.id,
  mapName: maps.name,
  kind: maps.kind,
  table: mapRevisions.table,
}

async function loadParts(ids: number[]): Promise<Map<number, SetPart>> {
  if (ids.length === 0) return new Map()
  const db = await getDb()
  const rows = await db
    .select(partColumns)
    .from(mapRevisions)
    .innerJoin(maps, eq(maps.id, mapRevisions.mapId))
    .innerJoin(users, eq(users.id, mapRevisions.authorId))
    .where(inArray(mapRevisions.id, ids))
  return new Map(rows.map((r) => [r.revisionId, r]))
}

export async function listSetReleases(setId: number, conn?: Db): Promise<SetRelease[]> {
  const db = conn ?? (await getDb())
  return db
    .select({
      id: setReleases.id,
      releasedAt: setReleases.releasedAt,
      releasedBy: setReleases.releasedBy,
      releasedByName: users.name,
      acknowledgements: setReleases.acknowledgements,
      coverageWaivers: setReleases.coverageWaivers,
      packageKey: setReleases.packageKey,
      packageName: setReleases.packageName,
      packageBytes: setReleases.packageBytes,
      packageSha256: setReleases.packageSha256,
      manifest: setReleases.manifest,
      retiredAt: setReleases.retiredAt,
      withdrawnAt: setReleases.withdrawnAt,
      withdrawReason: setReleases.withdrawReason,
    })
    .from(setReleases)
    .innerJoin(users, eq(users.id, setReleases.releasedBy))
    .where(eq(setReleases.setId, setId))
    .orderBy(desc(setReleases.releasedAt), desc(setReleases.id))
}

const creator = alias(users, 'creator')

/** A set's own columns with its program's name (queries from map_sets joined to vehicle_programs). */
const setColumns = {
  id: mapSets.id,
  number: mapSets.number,
  programId: mapSets.programId,
  programName: vehiclePrograms.name,
  note: mapSets.note,
  createdAt: mapSets.createdAt,
}

/** One set with its parts (tables included), parameter version and releases. */
export async function getSet(id: number): Promise<MapSetFull | null> {
  const db = await getDb()
  const [row] = await db
    .select({
      ...setColumns,
      createdByName: creator.name,
      driveRevisionId: mapSets.driveRevisionId,
      regenRevisionId: mapSets.regenRevisionId,
      pv: { id: paramVersions.id, number: paramVersions.number, params: paramVersions.params, releaseConditions: paramVersions.releaseConditions, reason: paramVersions.reason, createdAt: paramVersions.createdAt },
      rv: { id: rampVersions.id, number: rampVersions.number, limits: rampVersions.limits, reason: rampVersions.reason, createdAt: rampVersions.createdAt },
    })
    .from(mapSets)
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, mapSets.programId))
    .innerJoin(paramVersions, eq(paramVersions.id, mapSets.paramVersionId))
    .leftJoin(rampVersions, eq(rampVersions.id, mapSets.rampVersionId))
    .leftJoin(creator, eq(creator.id, mapSets.createdBy))
    .where(eq(mapSets.id, id))
  if (!row) return null
  const parts = await loadParts([row.driveRevisionId, row.regenRevisionId].filter((x): x is number => x !== null))
  const releases = await listSetReleases(id)
  const { driveRevisionId, regenRevisionId, pv, rv, ...rest } = row
  return {
    ...rest,
    drive: driveRevisionId ? (parts.get(driveRevisionId) ?? null) : null,
    regen: regenRevisionId ? (parts.get(regenRevisionId) ?? null) : null,
    paramVersion: pv,
    rampVersion: rv?.id ? rv : null,
    releases,
    status: setStatus(releases),
  }
}

/** The latest release row of the set in the outer query: its state decides the set's status. */
const latestRelease = (col: 'retired_at' | 'withdrawn_at' | 'id') =>
  sql.raw(`(select sr.${col} from set_releases sr where sr.set_id = map_sets.id order by sr.released_at desc, sr.id desc limit 1)`)

/** Sets, newest first, with their parts named and their status; filtered by program or by a revision they hold. */
export async function listSets(filter: { programId?: number; revisionId?: number; ids?: number[] } = {}) {
  const db = await getDb()
  const conds = []
  if (filter.programId) conds.push(eq(mapSets.programId, filter.programId))
  if (filter.revisionId) conds.push(or(eq(mapSets.driveRevisionId, filter.revisionId), eq(mapSets.regenRevisionId, filter.revisionId))!)
  if (filter.ids) conds.push(filter.ids.length ? inArray(mapSets.id, filter.ids) : sql`false`)
  const rows = await db
    .select({
      ...setColumns,
      ...setPartColumns,
      paramVersion: paramVersions.number,
      rampVersion: rampVersions.number,
      params: paramVersions.params,
      reports: sql<number>`(select count(*) from drive_reports d where d.set_id = map_sets.id)::int`,
      releaseId: sql<number | null>`${latestRelease('id')}`,
      retiredAt: sql<string | null>`${latestRelease('retired_at')}`,
      withdrawnAt: sql<string | null>`${latestRelease('withdrawn_at')}`,
    })
    .from(mapSets)
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, mapSets.programId))
    .innerJoin(paramVersions, eq(paramVersions.id, mapSets.paramVersionId))
    .leftJoin(rampVersions, eq(rampVersions.id, mapSets.rampVersionId))
    .leftJoin(driveRev, eq(driveRev.id, mapSets.driveRevisionId))
    .leftJoin(driveMap, eq(driveMap.id, driveRev.mapId))
    .leftJoin(regenRev, eq(regenRev.id, mapSets.regenRevisionId))
    .leftJoin(regenMap, eq(regenMap.id, regenRev.mapId))
    .where(conds.length ? and(...conds) : undefined)
    .orderBy(desc(mapSets.createdAt), desc(mapSets.id))
    .limit(500)
  return rows.map(({ releaseId, retiredAt, withdrawnAt, ...r }) => ({
    ...r,
    reports: Number(r.reports),
    status: releaseId === null ? ('testing' as const) : setStatus([{ retiredAt: retiredAt ? new Date(retiredAt) : null, withdrawnAt: withdrawnAt ? new Date(withdrawnAt) : null }]),
  }))
}

export type SetSummary = Awaited<ReturnType<typeof listSets>>[number]

export type CreateSetResult = { id: number; number: number; existing: boolean }

/**
 * Create the set of these parts, or return the one that already holds exactly them (one
 * combination, one set). The program row is locked so numbers run 1, 2, 3 … without a race.
 */
export async function createSet(input: { programId: number; driveRevisionId: number; regenRevisionId: number; paramVersionId: number; rampVersionId?: number | null; note: string; createdBy: number }): Promise<CreateSetResult> {
  const db = await getDb()
  return db.transaction(async (tx) => {
    await tx.select({ id: vehiclePrograms.id }).from(vehiclePrograms).where(eq(vehiclePrograms.id, input.programId)).for('update')
    const key = partsKey(input)
    const [existing] = await tx.select({ id: mapSets.id, number: mapSets.number }).from(mapSets).where(and(eq(mapSets.programId, input.programId), eq(mapSets.partsKey, key)))
    if (existing) return { ...existing, existing: true }
    const [row] = await tx
      .insert(mapSets)
      .values({ ...input, partsKey: key, number: sql`(select coalesce(max(${mapSets.number}), 0) + 1 from ${mapSets} where ${mapSets.programId} = ${input.programId})` })
      .returning({ id: mapSets.id, number: mapSets.number })
    await recordAudit(
      { actorId: input.createdBy, action: 'set.create', entityType: 'map_set', entityId: row.id, details: { number: row.number, driveRevisionId: input.driveRevisionId, regenRevisionId: input.regenRevisionId, paramVersionId: input.paramVersionId, rampVersionId: input.rampVersionId ?? null } },
      tx,
    )
    return { ...row, existing: false }
  })
}

/** Reports on a set with an open safety concern, and reports anywhere whose concern sits on one of these revisions. */
export async function openSafetyConcerns(revisionIds: number[]) {
  if (revisionIds.length === 0) return []
  const db = await getDb()
  const rows = await db
    .select({ reportId: driveReports.id, setId: driveReports.setId, setNumber: mapSets.number, flags: driveReports.flags, driveRevisionId: mapSets.driveRevisionId, regenRevisionId: mapSets.regenRevisionId })
    .from(driveReports)
    .innerJoin(mapSets, eq(mapSets.id, driveReports.setId))
    .where(and(eq(driveReports.safety, 'open'), or(inArray(mapSets.driveRevisionId, revisionIds), inArray(mapSets.regenRevisionId, revisionIds))))
  // A concern is found on the revisions its severity-4 flags point at (all of the set's, if it names none).
  return rows
    .map((r) => {
      const kinds = new Set(r.flags.filter((f) => f.severity === 4).map((f) => f.map))
      const on = [kinds.size === 0 || kinds.has('drive') ? r.driveRevisionId : null, kinds.size === 0 || kinds.has('regen') ? r.regenRevisionId : null].filter((x): x is number => x !== null)
      return { reportId: r.reportId, setId: r.setId, setNumber: r.setNumber, revisionIds: on.filter((id) => revisionIds.includes(id)) }
    })
    .filter((c) => c.revisionIds.length > 0)
}

/**
 * Inside a release: retire the program's current set release, record this one (frozen: package
 * and acknowledgements are written once here) and move the revisions' states: this set's to
 * released, the replaced set's that are not in this one to retired. Events and audit row included.
 * The drive reports on the set are the release's evidence: they are marked read by the releasing
 * lead, which ends their drivers' edits and log uploads. Null when the set is already released.
 */
export async function recordSetRelease(
  tx: Tx,
  r: {
    setId: number
    programId: number
    releasedBy: number
    releasedAt: Date
    acknowledgements: AcknowledgementRecord[]
    coverageWaivers: CoverageWaiverRecord[]
    package: { key: string; name: string; bytes: number; sha256: string; manifest: Record<string, unknown> }
    revisionIds: number[]
    mail: OutgoingMail[]
  },
): Promise<number | null> {
  // The program row is the lock every release and withdrawal of the program takes, so two leads
  // releasing the same set at once are put in line and the second finds it released already.
  await tx.select({ id: vehiclePrograms.id }).from(vehiclePrograms).where(eq(vehiclePrograms.id, r.programId)).for('update')
  const [already] = await tx
    .select({ id: setReleases.id })
    .from(setReleases)
    .where(and(eq(setReleases.setId, r.setId), isNull(setReleases.retiredAt), isNull(setReleases.withdrawnAt)))
  if (already) return null
  const prior = await tx
    .update(setReleases)
    .set({ retiredAt: r.releasedAt })
    .where(and(eq(setReleases.programId, r.programId), isNull(setReleases.retiredAt), isNull(setReleases.withdrawnAt)))
    .returning({ setId: setReleases.setId })
  const [row] = await tx
    .insert(setReleases)
    .values({
      setId: r.setId,
      programId: r.programId,
      releasedBy: r.releasedBy,
      releasedAt: r.releasedAt,
      acknowledgements: r.acknowledgements,
      coverageWaivers: r.coverageWaivers,
      packageKey: r.package.key,
      packageName: r.package.name,
      packageBytes: r.package.bytes,
      packageSha256: r.package.sha256,
      manifest: r.package.manifest,
    })
    .returning({ id: setReleases.id })
  await tx
    .update(driveReports)
    .set({ leadReadAt: r.releasedAt, leadReadBy: r.releasedBy })
    .where(and(eq(driveReports.setId, r.setId), isNull(driveReports.leadReadAt)))
  await moveRevisions(tx, r.revisionIds, ['approved', 'retired'], 'released', 'release', r.releasedBy, `Released in set ${r.setId}`)
  if (prior[0]) {
    const old = await partsOf(tx, prior[0].setId)
    await moveRevisions(tx, old.filter((id) => !r.revisionIds.includes(id)), ['released'], 'retired', 'release', r.releasedBy, `Replaced by the release of set ${r.setId}`)
  }
  await recordAudit(
    { actorId: r.releasedBy, action: 'set.release', entityType: 'map_set', entityId: r.setId, details: { releaseId: row.id, packageSha256: r.package.sha256, acknowledgements: r.acknowledgements.map((a) => ({ key: a.key, reason: a.reason })), coverageWaivers: r.coverageWaivers.map((w) => ({ key: w.key, reason: w.reason })), replacedSetId: prior[0]?.setId ?? null } },
    tx,
  )
  await enqueueMail(r.mail, tx)
  return row.id
}

async function partsOf(tx: Tx, setId: number): Promise<number[]> {
  const [s] = await tx.select({ d: mapSets.driveRevisionId, r: mapSets.regenRevisionId }).from(mapSets).where(eq(mapSets.id, setId))
  return [s?.d, s?.r].filter((x): x is number => typeof x === 'number')
}

async function moveRevisions(tx: Tx, ids: number[], from: RevisionState[], to: RevisionState, action: 'release' | 'withdraw', actorId: number, comment: string) {
  if (ids.length === 0) return
  const rows = await tx.select({ id: mapRevisions.id, state: mapRevisions.state }).from(mapRevisions).where(and(inArray(mapRevisions.id, ids), inArray(mapRevisions.state, from))).for('update')
  for (const m of rows) {
    await tx.update(mapRevisions).set({ state: to }).where(eq(mapRevisions.id, m.id))
    await tx.insert(revisionEvents).values({ revisionId: m.id, actorId, action, fromState: m.state, toState: to, comment })
  }
}

/**
 * Inside a withdrawal: close the set's current release and bring back the release it replaced,
 * if any. Revisions of the withdrawn set that the restored set does not hold become withdrawn.
 */
export async function recordSetWithdrawal(tx: Tx, w: { setId: number; programId: number; actorId: number; reason: string; mail: OutgoingMail[] }): Promise<{ ok: boolean; restoredSetId: number | null }> {
  await tx.select({ id: vehiclePrograms.id }).from(vehiclePrograms).where(eq(vehiclePrograms.id, w.programId)).for('update')
  const closed = await tx
    .update(setReleases)
    .set({ withdrawnAt: new Date(), withdrawnBy: w.actorId, withdrawReason: w.reason })
    .where(and(eq(setReleases.setId, w.setId), isNull(setReleases.retiredAt), isNull(setReleases.withdrawnAt)))
    .returning({ id: setReleases.id })
  if (!closed[0]) return { ok: false, restoredSetId: null }
  const previous = await releaseToRestore(w.programId, tx)
  const mine = await partsOf(tx, w.setId)
  let restored: number[] = []
  if (previous) {
    await tx.update(setReleases).set({ retiredAt: null }).where(eq(setReleases.id, previous.id))
    restored = await partsOf(tx, previous.setId)
    await moveRevisions(tx, restored, ['retired', 'approved'], 'released', 'release', w.actorId, `Brought back by the withdrawal of set ${w.setId}`)
  }
  await moveRevisions(tx, mine.filter((id) => !restored.includes(id)), ['released'], 'withdrawn', 'withdraw', w.actorId, w.reason)
  await recordAudit({ actorId: w.actorId, action: 'set.withdraw', entityType: 'map_set', entityId: w.setId, details: { releaseId: closed[0].id, reason: w.reason, restoredSetId: previous?.setId ?? null } }, tx)
  await enqueueMail(w.mail, tx)
  return { ok: true, restoredSetId: previous?.setId ?? null }
}

/**
 * The release a withdrawal of the current one brings back: the latest replaced release, never one
 * whose set has been withdrawn since (a set released again and then withdrawn leaves an older,
 * retired row). The withdrawal and the lead's confirmation both ask this.
 */
export async function releaseToRestore(programId: number, conn?: Pick<Db, 'select'>): Promise<{ id: number; setId: number; setNumber: number } | null> {
  const [row] = await (conn ?? (await getDb()))
    .select({ id: setReleases.id, setId: setReleases.setId, setNumber: mapSets.number })
    .from(setReleases)
    .innerJoin(mapSets, eq(mapSets.id, setReleases.setId))
    .where(
      and(
        eq(setReleases.programId, programId),
        isNull(setReleases.withdrawnAt),
        sql`${setReleases.retiredAt} is not null`,
        sql.raw('not exists (select 1 from set_releases w where w.set_id = set_releases.set_id and w.withdrawn_at is not null)'),
      ),
    )
    .orderBy(desc(setReleases.releasedAt), desc(setReleases.id))
    .limit(1)
  return row ?? null
}

/** The program's current released set, if any. */
export async function currentSetRelease(programId: number) {
  const db = await getDb()
  const [row] = await db
    .select({ id: setReleases.id, setId: setReleases.setId, setNumber: mapSets.number, releasedAt: setReleases.releasedAt, releasedByName: users.name, driveRevisionId: mapSets.driveRevisionId, regenRevisionId: mapSets.regenRevisionId })
    .from(setReleases)
    .innerJoin(mapSets, eq(mapSets.id, setReleases.setId))
    .innerJoin(users, eq(users.id, setReleases.releasedBy))
    .where(and(eq(setReleases.programId, programId), isNull(setReleases.retiredAt), isNull(setReleases.withdrawnAt)))
  return row ?? null
}

/** Whether a set with this id exists: a cheap check a page makes before its slow loading starts. */
export async function setExists(id: number): Promise<boolean> {
  const db = await getDb()
  const rows = await db.select({ id: mapSets.id }).from(mapSets).where(eq(mapSets.id, id))
  return rows.length > 0
}

/**
 * The release before one released at `releasedAt` in this program: the one in the trucks just
 * before (released earlier, not withdrawn by then; a retirement at that moment is this release
 * replacing it), else the latest earlier release even though it was withdrawn (`withdrawnAt` says
 * so), so a release after a withdrawal still compares with what was driven before. Null for a
 * program's first release.
 */
export async function releaseBefore(programId: number, releasedAt: Date) {
  const db = await getDb()
  const earlier = (alsoWithdrawn: boolean) =>
    db
      .select({ setId: setReleases.setId, setNumber: mapSets.number, releasedAt: setReleases.releasedAt, withdrawnAt: setReleases.withdrawnAt, driveRevisionId: mapSets.driveRevisionId, regenRevisionId: mapSets.regenRevisionId, paramVersion: paramVersions.number })
      .from(setReleases)
      .innerJoin(mapSets, eq(mapSets.id, setReleases.setId))
      .innerJoin(paramVersions, eq(paramVersions.id, mapSets.paramVersionId))
      .where(and(eq(setReleases.programId, programId), sql`${setReleases.releasedAt} < ${releasedAt}`, alsoWithdrawn ? undefined : or(isNull(setReleases.withdrawnAt), sql`${setReleases.withdrawnAt} > ${releasedAt}`)))
      .orderBy(desc(setReleases.releasedAt), desc(setReleases.id))
      .limit(1)
  const [inTrucks] = await earlier(false)
  if (inTrucks) return { ...inTrucks, withdrawnAt: null }
  const [withdrawn] = await earlier(true)
  return withdrawn ?? null
}

import { and, asc, desc, eq, inArray, isNull, or, type SQL } from 'drizzle-orm'
import { driveMap, driveRev, regenMap, regenRev, setPartColumns } from './set-parts'
import { listSets } from './sets'
import { getDb, type Db } from '../client'
import { SAFETY_SEVERITY } from '../../domain/report-safety'
import type { SurfaceId } from '../../physics/surfaces'
import type { LoadCase } from '../../physics/vehicle'
import { loadCasesFor } from '../../physics/load-cases'
import { driveReports, mapRevisions, mapSets, paramVersions, reportComments, users, vehiclePrograms, type ReportFlag, type ReportRatings } from '../schema'
import { recordAudit } from './audit'
import { enqueueMail, type OutgoingMail } from './mail'

/** What a driver writes; the set is chosen at filing and is not among the fields an edit changes. */
export interface ReportFields {
  drivenOn: string
  vehicleUnit: string
  route: string
  surface: SurfaceId
  weather: string
  ambientC: number
  loadCase: LoadCase
  payloadKg: number
  trailer: boolean
  ratings: ReportRatings
  comments: string
  flags: ReportFlag[]
}

const safetyFlags = (flags: ReportFlag[]) => flags.filter((f) => f.severity === SAFETY_SEVERITY).length

const columns = {
  id: driveReports.id,
  setId: driveReports.setId,
  setNumber: mapSets.number,
  paramVersionId: mapSets.paramVersionId,
  paramVersion: paramVersions.number,
  ...setPartColumns,
  programId: vehiclePrograms.id,
  programName: vehiclePrograms.name,
  driverId: driveReports.driverId,
  driverName: users.name,
  drivenOn: driveReports.drivenOn,
  vehicleUnit: driveReports.vehicleUnit,
  route: driveReports.route,
  surface: driveReports.surface,
  weather: driveReports.weather,
  ambientC: driveReports.ambientC,
  loadCase: driveReports.loadCase,
  payloadKg: driveReports.payloadKg,
  trailer: driveReports.trailer,
  ratings: driveReports.ratings,
  comments: driveReports.comments,
  flags: driveReports.flags,
  safety: driveReports.safety,
  safetyResolvedAt: driveReports.safetyResolvedAt,
  safetyResolution: driveReports.safetyResolution,
  leadReadAt: driveReports.leadReadAt,
  createdAt: driveReports.createdAt,
  updatedAt: driveReports.updatedAt,
}

async function selectReports(where: SQL | undefined, limit = 200) {
  const db = await getDb()
  return db
    .select(columns)
    .from(driveReports)
    .innerJoin(mapSets, eq(mapSets.id, driveReports.setId))
    .innerJoin(paramVersions, eq(paramVersions.id, mapSets.paramVersionId))
    .innerJoin(vehiclePrograms, eq(vehiclePrograms.id, mapSets.programId))
    .leftJoin(driveRev, eq(driveRev.id, mapSets.driveRevisionId))
    .leftJoin(driveMap, eq(driveMap.id, driveRev.mapId))
    .leftJoin(regenRev, eq(regenRev.id, mapSets.regenRevisionId))
    .leftJoin(regenMap, eq(regenMap.id, regenRev.mapId))
    .innerJoin(users, eq(users.id, driveReports.driverId))
    .where(where)
    .orderBy(desc(driveReports.drivenOn), desc(driveReports.id))
    .limit(limit)
}

export type ReportRow = Awaited<ReturnType<typeof selectReports>>[number]

export async function getReport(id: number): Promise<ReportRow | null> {
  return (await selectReports(eq(driveReports.id, id), 1))[0] ?? null
}

/** Reports filtered by set, by a revision or map their set holds, by driver or by an open safety concern. */
export async function listReports(filter: { setId?: number; revisionId?: number; mapId?: number; programId?: number; driverId?: number; openSafety?: boolean } = {}) {
  const conds: SQL[] = []
  if (filter.setId) conds.push(eq(driveReports.setId, filter.setId))
  if (filter.revisionId) conds.push(or(eq(mapSets.driveRevisionId, filter.revisionId), eq(mapSets.regenRevisionId, filter.revisionId))!)
  if (filter.mapId) conds.push(or(eq(driveMap.id, filter.mapId), eq(regenMap.id, filter.mapId))!)
  if (filter.programId) conds.push(eq(mapSets.programId, filter.programId))
  if (filter.driverId) conds.push(eq(driveReports.driverId, filter.driverId))
  if (filter.openSafety) conds.push(eq(driveReports.safety, 'open'))
  return selectReports(conds.length ? and(...conds) : undefined)
}

/** `safetyMail` is queued in the same transaction when the report opens a safety concern; `conn`: an enclosing transaction. */
export async function createReport(input: ReportFields & { setId: number }, driverId: number, safetyMail?: (id: number) => OutgoingMail, conn?: Db): Promise<number> {
  const db = conn ?? (await getDb())
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(driveReports)
      .values({ ...input, driverId, safety: safetyFlags(input.flags) > 0 ? 'open' : 'none' })
      .returning({ id: driveReports.id })
    await recordAudit({ actorId: driverId, action: 'report.create', entityType: 'drive_report', entityId: row.id, details: { setId: input.setId, safety: safetyFlags(input.flags) > 0 } }, tx)
    if (safetyFlags(input.flags) > 0 && safetyMail) await enqueueMail([safetyMail(row.id)], tx)
    return row.id
  })
}

/**
 * Replace a report's fields. A safety concern never closes by editing: once open it stays open
 * until a lead resolves it, and a resolved one reopens if more severity-4 flags are added.
 */
export async function updateReport(id: number, input: ReportFields, actorId: number, safetyMail?: (id: number) => OutgoingMail): Promise<void> {
  const db = await getDb()
  await db.transaction(async (tx) => {
    const [cur] = await tx.select({ safety: driveReports.safety, flags: driveReports.flags }).from(driveReports).where(eq(driveReports.id, id)).for('update')
    const before = safetyFlags(cur.flags)
    const after = safetyFlags(input.flags)
    const safety = cur.safety === 'open' || (cur.safety === 'none' && after > 0) || (cur.safety === 'resolved' && after > before) ? 'open' : cur.safety
    await tx.update(driveReports).set({ ...input, safety, updatedAt: new Date() }).where(eq(driveReports.id, id))
    if (safety === 'open' && cur.safety !== 'open' && safetyMail) await enqueueMail([safetyMail(id)], tx)
    await recordAudit({ actorId, action: 'report.update', entityType: 'drive_report', entityId: id, details: { safety } }, tx)
  })
}

export async function resolveSafety(id: number, leadId: number, comment: string): Promise<boolean> {
  const db = await getDb()
  return db.transaction(async (tx) => {
    const rows = await tx
      .update(driveReports)
      .set({ safety: 'resolved', safetyResolvedBy: leadId, safetyResolvedAt: new Date(), safetyResolution: comment, updatedAt: new Date() })
      .where(and(eq(driveReports.id, id), eq(driveReports.safety, 'open')))
      .returning({ id: driveReports.id })
    if (!rows[0]) return false
    await recordAudit({ actorId: leadId, action: 'report.safety-resolved', entityType: 'drive_report', entityId: id, details: { comment } }, tx)
    return true
  })
}

/** Per revision of the map: reports on sets holding it, and how many have an open safety concern (for the notebook). */
export async function reportCountsByRevision(mapId: number) {
  const db = await getDb()
  const revs = db.select({ id: mapRevisions.id }).from(mapRevisions).where(eq(mapRevisions.mapId, mapId))
  const rows = await db
    .select({ driveRevisionId: mapSets.driveRevisionId, regenRevisionId: mapSets.regenRevisionId, safety: driveReports.safety })
    .from(driveReports)
    .innerJoin(mapSets, eq(mapSets.id, driveReports.setId))
    .where(or(inArray(mapSets.driveRevisionId, revs), inArray(mapSets.regenRevisionId, revs)))
  const counts = new Map<number, { revisionId: number; reports: number; openSafety: number }>()
  for (const r of rows)
    for (const id of [r.driveRevisionId, r.regenRevisionId]) {
      if (id === null) continue
      const c = counts.get(id) ?? { revisionId: id, reports: 0, openSafety: 0 }
      c.reports++
      if (r.safety === 'open') c.openSafety++
      counts.set(id, c)
    }
  return [...counts.values()]
}

/**
 * A lead corrects the set a report was filed against (the driver chose wrongly); audited with
 * the reason. The report's logs are analysed again against the new set by the caller.
 */
export async function correctReportSet(id: number, setId: number, leadId: number, reason: string): Promise<{ from: number } | null> {
  const db = await getDb()
  return db.transaction(async (tx) => {
    const [cur] = await tx.select({ setId: driveReports.setId }).from(driveReports).where(eq(driveReports.id, id)).for('update')
    if (!cur) return null
    await tx.update(driveReports).set({ setId, updatedAt: new Date() }).where(eq(driveReports.id, id))
    await recordAudit({ actorId: leadId, action: 'report.set-corrected', entityType: 'drive_report', entityId: id, details: { fromSetId: cur.setId, toSetId: setId, reason } }, tx)
    return { from: cur.setId }
  })
}

/** A lead engineer has read the report: from now on the driver can no longer edit it. */
export async function markReportRead(id: number, leadId: number): Promise<void> {
  const db = await getDb()
  await db.transaction(async (tx) => {
    const rows = await tx.update(driveReports).set({ leadReadAt: new Date(), leadReadBy: leadId }).where(and(eq(driveReports.id, id), isNull(driveReports.leadReadAt))).returning({ id: driveReports.id })
    if (rows[0]) await recordAudit({ actorId: leadId, action: 'report.read', entityType: 'drive_report', entityId: id }, tx)
  })
}

export async function addReportComment(reportId: number, authorId: number, body: string, conn?: Db) {
  const db = conn ?? (await getDb())
  const [row] = await db.insert(reportComments).values({ reportId, authorId, body }).returning()
  return row
}

/** One comment as addReportComment returned it (a repeated request answers with the first). */
export async function getReportComment(id: number) {
  const db = await getDb()
  const [row] = await db.select().from(reportComments).where(eq(reportComments.id, id))
  return row ?? null
}

export async function listReportComments(reportId: number) {
  const db = await getDb()
  return db
    .select({ id: reportComments.id, body: reportComments.body, createdAt: reportComments.createdAt, authorName: users.name })
    .from(reportComments)
    .innerJoin(users, eq(users.id, reportComments.authorId))
    .where(eq(reportComments.reportId, reportId))
    .orderBy(asc(reportComments.createdAt))
}

/** One map of a set as the report form shows it: which map, which revision, and its checksum to compare with the vehicle. */
export interface SetChoicePart {
  mapId: number
  mapName: string
  revisionId: number
  number: number
  checksum: string
}

/** A set a driver can file a report against, with what the form needs to show and check it. */
export interface SetChoice {
  id: number
  number: number
  programId: number
  programName: string
  paramVersion: number
  /** The load cases its parameter version has. */
  loadCases: LoadCase[]
  /** It is the program's current release. */
  released: boolean
  drive: SetChoicePart | null
  regen: SetChoicePart | null
}

/** Sets for the report form, newest first (of one program, or the ones asked for by id). */
export async function setChoices(filter: { ids?: number[]; programId?: number } = {}): Promise<SetChoice[]> {
  const part = (revisionId: number | null, number: number | null, checksum: string | null, mapId: number | null, mapName: string | null): SetChoicePart | null =>
    revisionId !== null && number !== null && checksum !== null && mapId !== null && mapName !== null ? { revisionId, number, checksum, mapId, mapName } : null
  return (await listSets(filter)).map((r) => ({
    id: r.id,
    number: r.number,
    programId: r.programId,
    programName: r.programName,
    paramVersion: r.paramVersion,
    loadCases: loadCasesFor(r.params),
    released: r.status === 'released',
    drive: part(r.driveRevisionId, r.driveNumber, r.driveChecksum, r.driveMapId, r.driveMapName),
    regen: part(r.regenRevisionId, r.regenNumber, r.regenChecksum, r.regenMapId, r.regenMapName),
  }))
}

/** Addresses of everyone who wrote a revision of the map (its engineers). */
export async function engineersOfMap(mapId: number): Promise<string[]> {
  const db = await getDb()
  const rows = await db
    .selectDistinct({ email: users.email })
    .from(mapRevisions)
    .innerJoin(users, eq(users.id, mapRevisions.authorId))
    .where(and(eq(mapRevisions.mapId, mapId), eq(users.disabled, false)))
  return rows.map((r) => r.email)
}

/** Whether a drive report with this id exists (a layout's 404 decision, before the page's loading text streams). */
export async function reportExists(id: number): Promise<boolean> {
  const db = await getDb()
  const rows = await db.select({ id: driveReports.id }).from(driveReports).where(eq(driveReports.id, id))
  return rows.length > 0
}

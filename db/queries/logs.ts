import { and, asc, eq, gte, inArray, isNull, lt, lte, or, sql } from 'drizzle-orm'
import { getDb } from '../client'
import type { LogStatus } from '../../domain/log-statuses'
import type { AnalysisResult } from '../../physics/drive-log/types'
import { driveLogs, driveReports } from '../schema'
import { recordAudit } from './audit'

const columns = {
  id: driveLogs.id,
  reportId: driveLogs.reportId,
  objectKey: driveLogs.objectKey,
  fileName: driveLogs.fileName,
  sizeBytes: driveLogs.sizeBytes,
  status: driveLogs.status,
  progressBytes: driveLogs.progressBytes,
  errorMessage: driveLogs.errorMessage,
  mapping: driveLogs.mapping,
  createdAt: driveLogs.createdAt,
  analysedAt: driveLogs.analysedAt,
}

export async function createLog(input: { reportId: number; objectKey: string; fileName: string; sizeBytes: number; mapping: Record<string, string> }) {
  const db = await getDb()
  const [row] = await db.insert(driveLogs).values({ ...input, status: 'uploaded' }).returning(columns)
  return row
}

type LogInput = { reportId: number; objectKey: string; fileName: string; sizeBytes: number; mapping: Record<string, string> }

/**
 * A driver's upload, recorded with its audit row, unless a lead engineer has read the report
 * meanwhile: the report row is locked first, so a read and an upload cannot cross. Null when read.
 */
export async function addLogUnlessRead(input: LogInput, actorId: number) {
  const db = await getDb()
  return db.transaction(async (tx) => {
    const [report] = await tx.select({ leadReadAt: driveReports.leadReadAt }).from(driveReports).where(eq(driveReports.id, input.reportId)).for('update')
    if (!report || report.leadReadAt) return null
    const [row] = await tx.insert(driveLogs).values({ ...input, status: 'uploaded' }).returning(columns)
    await recordAudit({ actorId, action: 'report.log-upload', entityType: 'drive_report', entityId: input.reportId, details: { logId: row.id, fileName: row.fileName, sizeBytes: row.sizeBytes } }, tx)
    return row
  })
}

/**
 * Remove a log of a report a lead has not read yet, with its audit row (what was removed, and
 * the storage key its file had). The caller deletes the stored file after. 'read' when read.
 */
export async function removeLogUnlessRead(logId: number, reportId: number, actorId: number) {
  const db = await getDb()
  return db.transaction(async (tx) => {
    const [report] = await tx.select({ leadReadAt: driveReports.leadReadAt }).from(driveReports).where(eq(driveReports.id, reportId)).for('update')
    if (!report) return null
    if (report.leadReadAt) return 'read' as const
    const [row] = await tx.delete(driveLogs).where(and(eq(driveLogs.id, logId), eq(driveLogs.reportId, reportId))).returning(columns)
    if (!row) return null
    await recordAudit({ actorId, action: 'report.log-remove', entityType: 'drive_report', entityId: reportId, details: { logId, fileName: row.fileName, sizeBytes: row.sizeBytes, status: row.status, objectKey: row.objectKey } }, tx)
    return row
  })
}

/**
 * The filing driver corrects a log's column mapping: the new mapping is stored and the log goes back
 * to 'uploaded' for any server's worker, with its audit row (old and new mapping), unless a lead has
 * read the report meanwhile (the report row is locked first). 'read' when read; null when no such log.
 */
export async function remapLogUnlessRead(logId: number, reportId: number, mapping: Record<string, string>, actorId: number) {
  const db = await getDb()
  return db.transaction(async (tx) => {
    const [report] = await tx.select({ leadReadAt: driveReports.leadReadAt }).from(driveReports).where(eq(driveReports.id, reportId)).for('update')
    if (!report) return null
    if (report.leadReadAt) return 'read' as const
    const [before] = await tx.select({ mapping: driveLogs.mapping }).from(driveLogs).where(and(eq(driveLogs.id, logId), eq(driveLogs.reportId, reportId)))
    if (!before) return null
    const [row] = await tx
      .update(driveLogs)
      .set({ mapping, status: 'uploaded', progressBytes: 0, errorMessage: null, claimedBy: null, leaseUntil: null, attempts: 0 })
      .where(eq(driveLogs.id, logId))
      .returning(columns)
    await recordAudit({ actorId, action: 'report.log-remap', entityType: 'drive_report', entityId: reportId, details: { logId, fileName: row.fileName, from: before.mapping, to: mapping } }, tx)
    return row
  })
}

export async function listLogs(reportId: number) {
  const db = await getDb()
  return db.select(columns).from(driveLogs).where(eq(driveLogs.reportId, reportId)).orderBy(asc(driveLogs.id))
}

export async function getLog(id: number) {
  const db = await getDb()
  const rows = await db.select({ ...columns, analysis: driveLogs.analysis }).from(driveLogs).where(eq(driveLogs.id, id))
  return rows[0] ?? null
}

export async function setLogProgress(id: number, patch: Partial<{ status: LogStatus; progressBytes: number; errorMessage: string | null; analysis: AnalysisResult; analysedAt: Date }>) {
  const db = await getDb()
  await db.update(driveLogs).set(patch).where(eq(driveLogs.id, id))
}

// ── Analysis jobs ─────────────────────────────────────────────────────────────────────────────────
// A log waiting for analysis ('uploaded') or whose analyser's lease ran out ('analysing', lease_until
// past: that server died) may be claimed by any server. The claim names its holder (claimed_by, one
// token per claim) and lasts until lease_until, which the holder pushes on with each progress write.
// All times are the database's clock (now()), never a server's.

/** One claim of one log: the token its writes must carry, and which attempt this is (1 for the first). */
export interface LogClaim {
  logId: number
  token: string
  attempts: number
}

/** now() + ms, on the database's clock. */
const leaseEnd = (leaseMs: number) => sql`now() + ${Math.max(0, Math.round(leaseMs))}::integer * interval '1 millisecond'`

/** Held by `token` and still being analysed: the only rows a claim's writes may touch. */
const heldBy = (id: number, token: string) => and(eq(driveLogs.id, id), eq(driveLogs.claimedBy, token), eq(driveLogs.status, 'analysing'))

/** 'analysing' whose lease is over (or never set: a row from before leases). */
const leaseOver = and(eq(driveLogs.status, 'analysing'), or(isNull(driveLogs.leaseUntil), lte(driveLogs.leaseUntil, sql`now()`)))

/** Ask the analysis to run: what a failed attempt, a re-analysis, or a give-up message said is cleared. */
const fresh = { status: 'analysing' as const, progressBytes: 0, errorMessage: null }

/**
 * Claim the oldest log waiting for analysis, or one whose analyser's lease is over, for `token`:
 * status 'analysing', lease_until = now() + leaseMs, attempts + 1. The row is picked with
 * `FOR UPDATE SKIP LOCKED`, so servers claiming at once each get a different log (or none) without
 * waiting for one another. Before that, a log whose lease ran out `maxAttempts` times is failed with a
 * message saying so (the file is kept; a re-analysis starts the count again). Null when none waits.
 */
export async function claimNextLog(token: string, leaseMs: number, maxAttempts: number): Promise<LogClaim | null> {
  const db = await getDb()
  return db.transaction(async (tx) => {
    const worn = tx.select({ id: driveLogs.id }).from(driveLogs).where(and(leaseOver, gte(driveLogs.attempts, maxAttempts))).for('update', { skipLocked: true })
    await tx
      .update(driveLogs)
      .set({
        status: 'failed',
        errorMessage: sql`'The analysis was interrupted ' || ${driveLogs.attempts} || ' times (a server stopped while it ran); the file is kept; run the analysis again'`,
        leaseUntil: null,
      })
      .where(inArray(driveLogs.id, worn))
    const [next] = await tx
      .select({ id: driveLogs.id })
      .from(driveLogs)
      .where(or(eq(driveLogs.status, 'uploaded'), and(leaseOver, lt(driveLogs.attempts, maxAttempts))))
      .orderBy(asc(driveLogs.id))
      .limit(1)
      .for('update', { skipLocked: true })
    if (!next) return null
    const [row] = await tx
      .update(driveLogs)
      .set({ ...fresh, claimedBy: token, leaseUntil: leaseEnd(leaseMs), attempts: sql`${driveLogs.attempts} + 1` })
      .where(eq(driveLogs.id, next.id))
      .returning({ logId: driveLogs.id, attempts: driveLogs.attempts })
    return { ...row, token }
  })
}

/**
 * Claim one given log now, whatever its state (the demo seed and tests run an analysis directly):
 * a holder it had loses it, and its writes are refused from then on. Null when there is no such log.
 */
export async function claimLog(id: number, token: string, leaseMs: number): Promise<LogClaim | null> {
  const db = await getDb()
  const [row] = await db
    .update(driveLogs)
    .set({ ...fresh, claimedBy: token, leaseUntil: leaseEnd(leaseMs), attempts: sql`${driveLogs.attempts} + 1` })
    .where(eq(driveLogs.id, id))
    .returning({ logId: driveLogs.id, attempts: driveLogs.attempts })
  return row ? { ...row, token } : null
}

/**
 * The heartbeat: push the lease on by leaseMs from now, with the progress so far. False when the
 * claim is no longer held (the lease ran out and another server took the log, or it was asked for
 * again, released or removed): the analysis should stop, its result would be refused.
 */
export async function extendLogLease(claim: LogClaim, leaseMs: number, progressBytes?: number): Promise<boolean> {
  const db = await getDb()
  const rows = await db
    .update(driveLogs)
    .set({ leaseUntil: leaseEnd(leaseMs), ...(progressBytes === undefined ? {} : { progressBytes }) })
    .where(heldBy(claim.logId, claim.token))
    .returning({ id: driveLogs.id })
  return rows.length > 0
}

/**
 * Write a claim's outcome, done or failed, only if the claim is still held: a server whose lease
 * was taken over cannot overwrite the newer analysis. False when it was not written.
 */
export async function finishClaimedLog(
  claim: LogClaim,
  outcome: { status: 'done'; progressBytes: number; analysis: AnalysisResult; analysedAt: Date } | { status: 'failed'; errorMessage: string },
): Promise<boolean> {
  const db = await getDb()
  const rows = await db
    .update(driveLogs)
    .set({ ...outcome, leaseUntil: null })
    .where(heldBy(claim.logId, claim.token))
    .returning({ id: driveLogs.id })
  return rows.length > 0
}

/**
 * Hand a claim back unfinished (the server is stopping): the lease ends now, so any server may take
 * the log at once, and the hand-back does not count as an interruption. False when it was not held.
 */
export async function releaseLog(claim: LogClaim): Promise<boolean> {
  const db = await getDb()
  const rows = await db
    .update(driveLogs)
    .set({ claimedBy: null, leaseUntil: sql`now()`, attempts: sql`greatest(${driveLogs.attempts} - 1, 0)` })
    .where(heldBy(claim.logId, claim.token))
    .returning({ id: driveLogs.id })
  return rows.length > 0
}

/**
 * Ask for a log's analysis again (re-analysis, a corrected set): back to 'uploaded' for any server's
 * worker, with the attempt count started again. A run in progress loses its claim, so it stops at its
 * next progress write and its result is not written. Null when there is no such log.
 */
export async function requeueLog(id: number) {
  const db = await getDb()
  const [row] = await db
    .update(driveLogs)
    .set({ status: 'uploaded', progressBytes: 0, errorMessage: null, claimedBy: null, leaseUntil: null, attempts: 0 })
    .where(eq(driveLogs.id, id))
    .returning(columns)
  return row ?? null
}

/** A log's job columns (tests and diagnostics). */
export async function getLogJob(id: number) {
  const db = await getDb()
  const [row] = await db
    .select({ status: driveLogs.status, claimedBy: driveLogs.claimedBy, leaseUntil: driveLogs.leaseUntil, attempts: driveLogs.attempts, leaseLive: sql<boolean>`coalesce(${driveLogs.leaseUntil} > now(), false)` })
    .from(driveLogs)
    .where(eq(driveLogs.id, id))
  return row ?? null
}

import { and, asc, eq } from 'drizzle-orm'
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

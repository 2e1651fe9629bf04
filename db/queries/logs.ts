import { asc, eq } from 'drizzle-orm'
import { getDb } from '../client'
import type { LogStatus } from '../../domain/log-statuses'
import type { AnalysisResult } from '../../physics/drive-log/types'
import { driveLogs } from '../schema'

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

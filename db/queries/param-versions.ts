import { and, desc, eq, sql } from 'drizzle-orm'
import type { VehicleParams } from '../../physics/vehicle'
import { getDb, type Db } from '../client'
import { paramVersions, users, vehiclePrograms, type ReleaseConditions } from '../schema'

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0]

export interface ParamVersion {
  id: number
  programId: number
  number: number
  params: VehicleParams
  releaseConditions: ReleaseConditions
  reason: string
  createdBy: number | null
  createdByName: string | null
  createdAt: Date
}

const columns = {
  id: paramVersions.id,
  programId: paramVersions.programId,
  number: paramVersions.number,
  params: paramVersions.params,
  releaseConditions: paramVersions.releaseConditions,
  reason: paramVersions.reason,
  createdBy: paramVersions.createdBy,
  createdByName: users.name,
  createdAt: paramVersions.createdAt,
}

/** A program's versions, newest first. */
export async function listParamVersions(programId: number): Promise<ParamVersion[]> {
  const db = await getDb()
  return db.select(columns).from(paramVersions).leftJoin(users, eq(users.id, paramVersions.createdBy)).where(eq(paramVersions.programId, programId)).orderBy(desc(paramVersions.number))
}

export async function getParamVersion(id: number): Promise<ParamVersion | null> {
  const db = await getDb()
  const rows = await db.select(columns).from(paramVersions).leftJoin(users, eq(users.id, paramVersions.createdBy)).where(eq(paramVersions.id, id))
  return rows[0] ?? null
}

export async function getParamVersionByNumber(programId: number, number: number): Promise<ParamVersion | null> {
  const db = await getDb()
  const rows = await db
    .select(columns)
    .from(paramVersions)
    .leftJoin(users, eq(users.id, paramVersions.createdBy))
    .where(and(eq(paramVersions.programId, programId), eq(paramVersions.number, number)))
  return rows[0] ?? null
}

/** The program's latest version (the one new sets take by default). */
export async function latestParamVersion(programId: number): Promise<ParamVersion | null> {
  const db = await getDb()
  const rows = await db.select(columns).from(paramVersions).leftJoin(users, eq(users.id, paramVersions.createdBy)).where(eq(paramVersions.programId, programId)).orderBy(desc(paramVersions.number)).limit(1)
  return rows[0] ?? null
}

/**
 * Inside the transaction that changes a program: write the next version and copy it onto the
 * program row. The program row is locked first, so two concurrent edits get numbers n and n + 1.
 */
export async function insertParamVersion(
  tx: Tx,
  v: { programId: number; params: VehicleParams; releaseConditions: ReleaseConditions; reason: string; createdBy: number },
): Promise<{ id: number; number: number }> {
  await tx.select({ id: vehiclePrograms.id }).from(vehiclePrograms).where(eq(vehiclePrograms.id, v.programId)).for('update')
  const [row] = await tx
    .insert(paramVersions)
    .values({ ...v, number: sql`(select coalesce(max(${paramVersions.number}), 0) + 1 from ${paramVersions} where ${paramVersions.programId} = ${v.programId})` })
    .returning({ id: paramVersions.id, number: paramVersions.number })
  return row
}

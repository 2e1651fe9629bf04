import { and, desc, eq, sql } from 'drizzle-orm'
import type { RampLimits } from '../../maps/ramps'
import { getDb } from '../client'
import { rampVersions, users, vehiclePrograms } from '../schema'
import { recordAudit } from './audit'

export interface RampVersion {
  id: number
  programId: number
  number: number
  limits: RampLimits
  reason: string
  createdBy: number | null
  createdByName: string | null
  createdAt: Date
}

const columns = {
  id: rampVersions.id,
  programId: rampVersions.programId,
  number: rampVersions.number,
  limits: rampVersions.limits,
  reason: rampVersions.reason,
  createdBy: rampVersions.createdBy,
  createdByName: users.name,
  createdAt: rampVersions.createdAt,
}

async function select(where: ReturnType<typeof eq>, latest = false): Promise<RampVersion[]> {
  const db = await getDb()
  const q = db.select(columns).from(rampVersions).leftJoin(users, eq(users.id, rampVersions.createdBy)).where(where).orderBy(desc(rampVersions.number))
  return latest ? q.limit(1) : q
}

/** A program's ramp versions, newest first. */
export function listRampVersions(programId: number): Promise<RampVersion[]> {
  return select(eq(rampVersions.programId, programId))
}

export async function getRampVersion(id: number): Promise<RampVersion | null> {
  return (await select(eq(rampVersions.id, id)))[0] ?? null
}

export async function getRampVersionByNumber(programId: number, number: number): Promise<RampVersion | null> {
  return (await select(and(eq(rampVersions.programId, programId), eq(rampVersions.number, number))!))[0] ?? null
}

/** The version new sets take by default. */
export async function latestRampVersion(programId: number): Promise<RampVersion | null> {
  return (await select(eq(rampVersions.programId, programId), true))[0] ?? null
}

/** Write the program's next ramp version; the program row is locked so numbers run 1, 2, 3 … without a race. Audited. */
export async function insertRampVersion(v: { programId: number; limits: RampLimits; reason: string; createdBy: number }): Promise<{ id: number; number: number }> {
  const db = await getDb()
  return db.transaction(async (tx) => {
    await tx.select({ id: vehiclePrograms.id }).from(vehiclePrograms).where(eq(vehiclePrograms.id, v.programId)).for('update')
    const [row] = await tx
      .insert(rampVersions)
      .values({ ...v, number: sql`(select coalesce(max(${rampVersions.number}), 0) + 1 from ${rampVersions} where ${rampVersions.programId} = ${v.programId})` })
      .returning({ id: rampVersions.id, number: rampVersions.number })
    await recordAudit({ actorId: v.createdBy, action: 'program.new-ramp-version', entityType: 'program', entityId: v.programId, details: { number: row.number, reason: v.reason, limits: v.limits } }, tx)
    return row
  })
}

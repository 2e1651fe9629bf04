import { asc, eq, sql } from 'drizzle-orm'
import type { VehicleParams } from '../../physics/vehicle'
import { jsonChanges, type JsonChange } from '../../domain/json-changes'
import { getDb } from '../client'
import { vehiclePrograms, type ReleaseConditions } from '../schema'
import { recordAudit } from './audit'
import { insertParamVersion } from './param-versions'

const columns = {
  id: vehiclePrograms.id,
  name: vehiclePrograms.name,
  description: vehiclePrograms.description,
  params: vehiclePrograms.params,
  releaseConditions: vehiclePrograms.releaseConditions,
  createdAt: vehiclePrograms.createdAt,
  updatedAt: vehiclePrograms.updatedAt,
}

/** The latest parameter version's number of the program in the outer query. */
// Written out: in a one-table select Drizzle leaves columns unqualified, and an unqualified "id" in
// the subquery would be param_versions' own (the number then matched no program).
const paramVersionOf = sql<number>`(select max(pv.number) from param_versions pv where pv.program_id = vehicle_programs.id)`

export type ProgramRow = {
  id: number
  name: string
  description: string
  params: VehicleParams
  releaseConditions: ReleaseConditions
  /** Number of the latest parameter version (the program's params and releaseConditions are its copy). */
  paramVersion: number
  createdAt: Date
  updatedAt: Date
}

const withVersion = (r: Omit<ProgramRow, 'paramVersion'> & { paramVersion: unknown }): ProgramRow => ({ ...r, paramVersion: Number(r.paramVersion) })

export async function listPrograms(): Promise<ProgramRow[]> {
  const db = await getDb()
  return (await db.select({ ...columns, paramVersion: paramVersionOf }).from(vehiclePrograms).orderBy(asc(vehiclePrograms.name))).map(withVersion)
}

export async function getProgram(id: number): Promise<ProgramRow | null> {
  const db = await getDb()
  const rows = await db.select({ ...columns, paramVersion: paramVersionOf }).from(vehiclePrograms).where(eq(vehiclePrograms.id, id))
  return rows[0] ? withVersion(rows[0]) : null
}

export interface ProgramFields {
  name: string
  description: string
  params: VehicleParams
  releaseConditions: ReleaseConditions
}

/** Create a program and its parameter version 1 together. */
export async function createProgram(input: ProgramFields & { reason: string }, actorId: number): Promise<ProgramRow> {
  const db = await getDb()
  const id = await db.transaction(async (tx) => {
    const { reason, ...fields } = input
    const [row] = await tx.insert(vehiclePrograms).values({ ...fields, createdBy: actorId }).returning({ id: vehiclePrograms.id })
    const v = await insertParamVersion(tx, { programId: row.id, params: fields.params, releaseConditions: fields.releaseConditions, reason: reason || 'First version', createdBy: actorId })
    await recordAudit({ actorId, action: 'program.create', entityType: 'vehicle_program', entityId: row.id, details: { name: fields.name, paramVersion: v.number } }, tx)
    return row.id
  })
  return (await getProgram(id))!
}

export type UpdateResult = { ok: true; program: ProgramRow; newVersion: number | null } | { ok: false; reason: 'missing' | 'reason-required' }

/**
 * Change a program. A change to its parameters or release conditions writes a new, numbered
 * parameter version (a reason is required) and the audit row lists every changed field; what
 * was judged before keeps naming the version it was judged with.
 */
export async function updateProgram(id: number, input: ProgramFields & { reason: string }, actorId: number): Promise<UpdateResult> {
  const db = await getDb()
  const result = await db.transaction(async (tx) => {
    const [cur] = await tx.select(columns).from(vehiclePrograms).where(eq(vehiclePrograms.id, id)).for('update')
    if (!cur) return { ok: false, reason: 'missing' } as const
    const { reason, ...fields } = input
    const changes: JsonChange[] = jsonChanges({ params: cur.params, releaseConditions: cur.releaseConditions }, { params: fields.params, releaseConditions: fields.releaseConditions })
    const renamed = jsonChanges({ name: cur.name, description: cur.description }, { name: fields.name, description: fields.description })
    if (changes.length > 0 && !reason.trim()) return { ok: false, reason: 'reason-required' } as const
    let newVersion: number | null = null
    if (changes.length > 0) {
      const v = await insertParamVersion(tx, { programId: id, params: fields.params, releaseConditions: fields.releaseConditions, reason: reason.trim(), createdBy: actorId })
      newVersion = v.number
    }
    await tx.update(vehiclePrograms).set({ ...fields, updatedAt: new Date() }).where(eq(vehiclePrograms.id, id))
    if (changes.length > 0 || renamed.length > 0)
      await recordAudit(
        { actorId, action: changes.length > 0 ? 'program.new-param-version' : 'program.update', entityType: 'vehicle_program', entityId: id, details: { name: fields.name, paramVersion: newVersion, reason: reason.trim(), changes: [...renamed, ...changes] } },
        tx,
      )
    return { ok: true, newVersion } as const
  })
  if (!result.ok) return result
  return { ok: true, program: (await getProgram(id))!, newVersion: result.newVersion }
}

/** Whether a program with this id exists: a cheap check a page makes before its slow loading starts. */
export async function programExists(id: number): Promise<boolean> {
  const db = await getDb()
  const rows = await db.select({ id: vehiclePrograms.id }).from(vehiclePrograms).where(eq(vehiclePrograms.id, id))
  return rows.length > 0
}

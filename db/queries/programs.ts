import { asc, eq } from 'drizzle-orm'
import type { VehicleParams } from '../../physics/vehicle'
import { getDb } from '../client'
import { vehiclePrograms } from '../schema'
import { recordAudit } from './audit'

const columns = {
  id: vehiclePrograms.id,
  name: vehiclePrograms.name,
  description: vehiclePrograms.description,
  params: vehiclePrograms.params,
  createdAt: vehiclePrograms.createdAt,
  updatedAt: vehiclePrograms.updatedAt,
}

export type ProgramRow = {
  id: number
  name: string
  description: string
  params: VehicleParams
  createdAt: Date
  updatedAt: Date
}

export async function listPrograms(): Promise<ProgramRow[]> {
  const db = await getDb()
  return db.select(columns).from(vehiclePrograms).orderBy(asc(vehiclePrograms.name))
}

export async function getProgram(id: number): Promise<ProgramRow | null> {
  const db = await getDb()
  const rows = await db.select(columns).from(vehiclePrograms).where(eq(vehiclePrograms.id, id))
  return rows[0] ?? null
}

export async function createProgram(
  input: { name: string; description: string; params: VehicleParams },
  actorId: number,
): Promise<ProgramRow> {
  const db = await getDb()
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(vehiclePrograms)
      .values({ ...input, createdBy: actorId })
      .returning(columns)
    await recordAudit({ actorId, action: 'program.create', entityType: 'vehicle_program', entityId: row.id, details: { name: row.name } }, tx)
    return row
  })
}

export async function updateProgram(
  id: number,
  input: { name: string; description: string; params: VehicleParams },
  actorId: number,
): Promise<ProgramRow | null> {
  const db = await getDb()
  return db.transaction(async (tx) => {
    const rows = await tx
      .update(vehiclePrograms)
      .set({ ...input, updatedAt: new Date() })
      .where(eq(vehiclePrograms.id, id))
      .returning(columns)
    if (!rows[0]) return null
    await recordAudit({ actorId, action: 'program.update', entityType: 'vehicle_program', entityId: id, details: { name: input.name } }, tx)
    return rows[0]
  })
}

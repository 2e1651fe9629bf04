import { and, eq, sql } from 'drizzle-orm'
import type { Db } from './client'
import type { Role } from '../domain/roles'
import { maps, paramVersions, rampVersions, users, vehiclePrograms, type ReleaseConditions } from './schema'
import { DEMO_BATTERY_CORNERS, demoTipper, demoTractor } from './demo/programs'
import { starterRamps } from '../maps/ramps'
import { demoMapHistories } from './demo/maps'
import { insertRevision } from './queries/revisions'

/** The one password of every demo account (demo mode only; listed in the README). */
export const DEMO_PASSWORD = 'mapwright-demo'

/** Demo accounts of the invented conversion shop "Brackwater Electric Trucks". */
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@brackwater.example', name: 'Ines Admin', role: 'admin' },
  { email: 'lead@brackwater.example', name: 'Lena Lead', role: 'lead_engineer' },
  { email: 'lead2@brackwater.example', name: 'Omar Lead', role: 'lead_engineer' },
  { email: 'calib@brackwater.example', name: 'Cato Calibration', role: 'calibration_engineer' },
  { email: 'calib2@brackwater.example', name: 'Priya Calibration', role: 'calibration_engineer' },
  { email: 'calib3@brackwater.example', name: 'Jonas Calibration', role: 'calibration_engineer' },
  { email: 'driver@brackwater.example', name: 'Dara Driver', role: 'test_driver' },
  { email: 'driver2@brackwater.example', name: 'Mika Driver', role: 'test_driver' },
]

export const DEMO_PROGRAMS = [
  // The tipper declares a minimum lift-off deceleration (0.3 m/s², invented), so its sets show the
  // battery-corner finding; the tractor's corners are shown on the physics page without a minimum.
  {
    name: 'BX-64 Tipper',
    description: 'Demo: 6×4 battery-electric tipper for quarry and site work (invented numbers).',
    params: demoTipper,
    releaseConditions: { surfaces: ['wet-asphalt', 'packed-snow'], loadCases: ['empty', 'laden'], marginPct: 10, batteryCorners: DEMO_BATTERY_CORNERS } satisfies ReleaseConditions,
  },
  {
    name: 'BX-64 Tractor',
    description: 'Demo: 6×2 battery-electric tractor (tag axle) with a three-axle semitrailer (invented numbers).',
    params: demoTractor,
    releaseConditions: { surfaces: ['wet-asphalt', 'packed-snow'], loadCases: ['empty', 'laden'], marginPct: 10, batteryCorners: DEMO_BATTERY_CORNERS } satisfies ReleaseConditions,
  },
]

export interface SeedResult {
  usersAdded: number
  programsAdded: number
  mapsAdded: number
}

/**
 * Insert the demo scenario. Idempotent: existing rows (matched by email or name) are left alone,
 * so running the demo twice never duplicates anything.
 */
export async function seedDemo(db: Db, hashPassword: (p: string) => Promise<string>): Promise<SeedResult> {
  const passwordHash = await hashPassword(DEMO_PASSWORD)
  const addedUsers = await db
    .insert(users)
    .values(DEMO_USERS.map((u) => ({ ...u, passwordHash })))
    .onConflictDoNothing()
    .returning({ id: users.id })
  const [admin] = await db.select({ id: users.id }).from(users).where(sql`lower(${users.email}) = ${DEMO_USERS[0].email}`)
  const addedPrograms = await db
    .insert(vehiclePrograms)
    .values(DEMO_PROGRAMS.map((p) => ({ ...p, createdBy: admin?.id ?? null })))
    .onConflictDoNothing()
    .returning({ id: vehiclePrograms.id, params: vehiclePrograms.params, releaseConditions: vehiclePrograms.releaseConditions })
  // Every program has its parameters as version 1 (what sets are judged with).
  if (addedPrograms.length) {
    await db.insert(paramVersions).values(addedPrograms.map((p) => ({ programId: p.id, number: 1, params: p.params, releaseConditions: p.releaseConditions, reason: 'First version (demo data)', createdBy: admin?.id ?? null })))
    // Starter ramps scaled to each demo motor, so demo sets hold ramp limits too.
    await db.insert(rampVersions).values(addedPrograms.map((p) => ({ programId: p.id, number: 1, limits: starterRamps(p.params.motorPeakTorqueNm), reason: 'Starter ramps scaled to the motor (demo data)', createdBy: admin?.id ?? null })))
  }
  const mapsAdded = await seedMaps(db)
  return { usersAdded: addedUsers.length, programsAdded: addedPrograms.length, mapsAdded }
}

/** Demo maps with their revision histories; a map that already exists is left as it is. */
async function seedMaps(db: Db): Promise<number> {
  const authors = await db.select({ id: users.id, email: users.email }).from(users).where(sql`${users.role} in ('calibration_engineer', 'lead_engineer') and ${users.email} like '%@brackwater.example'`)
  if (authors.length === 0) return 0
  let added = 0
  for (const m of demoMapHistories(demoTipper, demoTractor)) {
    const [program] = await db.select({ id: vehiclePrograms.id }).from(vehiclePrograms).where(eq(vehiclePrograms.name, m.program))
    if (!program) continue
    const existing = await db.select({ id: maps.id }).from(maps).where(and(eq(maps.programId, program.id), eq(maps.name, m.name)))
    if (existing.length) continue
    await db.transaction(async (tx) => {
      const [map] = await tx.insert(maps).values({ programId: program.id, name: m.name, kind: m.kind, description: m.description, createdBy: authors[0].id }).returning({ id: maps.id })
      let parentId: number | null = null
      for (const [i, r] of m.revisions.entries()) {
        const author = authors[i % authors.length]
        const row = await insertRevision(tx, { mapId: map.id, number: i + 1, parentId, authorId: author.id, message: r.message, notes: r.notes ?? '', table: r.table })
        parentId = row.id
      }
    })
    added++
  }
  return added
}

/**
 * Shared parsing for the physics routes: load case, surface and grade from a query string or a
 * body, checked against the vehicle program, and physics input errors turned into 400s (the
 * shared error mapper does not know the physics module, and a bad input is the caller's fault).
 */
import 'server-only'
import { z } from 'zod'
import { LOAD_CASE_IDS, loadCasesFor, PhysicsInputError, SURFACE_IDS, type LoadCase, type VehicleParams } from '@/physics'
import { ValidationError } from '../http/errors'

export const loadCaseField = z.enum(LOAD_CASE_IDS, { error: `loadCase must be one of ${LOAD_CASE_IDS.join(', ')}` })
export const surfaceField = z.enum(SURFACE_IDS, { error: `surface must be one of ${SURFACE_IDS.join(', ')}` })
/** Road grade in %, uphill > 0; ±30 % covers any site road a truck should drive. */
export const gradePctField = z.coerce.number({ error: 'gradePct must be a number (%)' }).min(-30, 'gradePct must be at least −30 %').max(30, 'gradePct must be at most 30 %')

export const overlayQuerySchema = z.object({ loadCase: loadCaseField, surface: surfaceField, gradePct: gradePctField.default(0) })
export type OverlayQuery = z.infer<typeof overlayQuerySchema>

/** The query string of a request as a plain object, without empty values (so defaults apply). */
export function queryObject(req: Request): Record<string, string> {
  const out: Record<string, string> = {}
  for (const [k, v] of new URL(req.url).searchParams) if (v !== '') out[k] = v
  return out
}

/** Refuses a trailer load case on a program without a trailer, naming the cases it does have. */
export function checkLoadCase(vehicle: VehicleParams, loadCase: LoadCase): void {
  const offered = loadCasesFor(vehicle)
  if (!offered.includes(loadCase))
    throw new ValidationError(`loadCase: this vehicle program has no semitrailer; choose ${offered.join(' or ')}`)
}

/** Grade in % → rad (tan θ = rise/run). */
export const gradeRad = (gradePct: number): number => Math.atan(gradePct / 100)

/** Runs a physics computation; a PhysicsInputError becomes a 400 naming the field. */
export function physics<T>(run: () => T): T {
  try {
    return run()
  } catch (e) {
    if (e instanceof PhysicsInputError) throw new ValidationError(e.message, { field: e.field })
    throw e
  }
}

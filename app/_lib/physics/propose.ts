/**
 * A traction-safe draft of a stored revision: the proposal algorithm (physics/overlay-propose.ts)
 * fed with the traction torque limit per speed for the chosen load case and surface. Nothing is
 * saved here; the engineer saves the draft through the ordinary revisions route.
 */
import 'server-only'
import { z } from 'zod'
import type { MapTable } from '@/maps'
import { tractionLimitTorqueBySpeed, type VehicleParams } from '@/physics'
import { proposeTractionSafe } from '@/physics/overlay-propose'
import { checkLoadCase, gradePctField, gradeRad, loadCaseField, physics, surfaceField } from './query'

export const proposeBodySchema = z.object({
  loadCase: loadCaseField,
  surface: surfaceField,
  marginPct: z.number({ error: 'marginPct must be a number (%)' }).min(0, 'marginPct must be at least 0 %').max(50, 'marginPct must be at most 50 %').default(10),
  gradePct: gradePctField.default(0),
})
export type ProposeBody = z.infer<typeof proposeBodySchema>

/** The draft table, its changes (largest first) and the ceiling per speed column. */
export function proposeFor(vehicle: VehicleParams, table: MapTable, body: ProposeBody) {
  checkLoadCase(vehicle, body.loadCase)
  return physics(() => {
    const limits = tractionLimitTorqueBySpeed({ vehicle, loadCase: body.loadCase, surface: body.surface, gradeRad: gradeRad(body.gradePct), colAxis: table.colAxis, kind: table.kind })
    const p = proposeTractionSafe(table, limits.map((l) => l.tractionLimitNm), body.marginPct)
    return { table: p.table, changes: p.changes, ceilingByCol: p.ceilingByCol }
  })
}

export type ProposalResponse = ReturnType<typeof proposeFor> & { mapId: number; baseNumber: number; latestNumber: number }

/**
 * Start and hold on grade for a set: the version's declared start grade and hold grade × speed,
 * checked on the set's drive map at full pedal for the laden load on dry asphalt (physics/gradeability.ts).
 * Versions that declare neither judge as before: no checks, no gate condition.
 */
import type { ReleaseConditions } from '@/db/schema'
import { checkGrade, gradeDemands, type GradeCheck } from '@/physics/gradeability'
import type { MapTable } from '@/physics/table'
import type { VehicleParams } from '@/physics/vehicle'
import { physics } from '../physics/query'

/** True when the version declares a start grade or a hold grade. */
export function declaresGrade(c: ReleaseConditions): boolean {
  return c.startGradePct !== undefined || c.holdGradePct !== undefined || c.holdSpeedKmh !== undefined
}

/** The checks of the declared requirements on a drive map; [] when none are declared. */
export function gradeChecks(vehicle: VehicleParams, drive: MapTable, c: ReleaseConditions): GradeCheck[] {
  return physics(() => gradeDemands(c).map((d) => checkGrade({ vehicle, drive }, d)))
}

const r0 = (x: number) => Math.round(x)

/** One line per check for the gate's details and the page. */
export function gradeLine(k: GradeCheck): string {
  return `${k.kind === 'start' ? `Start on ${k.gradePct} %` : `Hold ${k.speedKmh} km/h on ${k.gradePct} %`}: needs ${r0(k.neededNm)} N·m, map gives ${r0(k.availableNm)} N·m, tyres allow ${r0(k.tractionNm)} N·m — ${k.explanation}`
}

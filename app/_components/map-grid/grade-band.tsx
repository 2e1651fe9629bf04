'use client'
/**
 * The band the full-pedal row of a drive map must lie in, per speed breakpoint: enough torque to climb the
 * program's declared grade laden, no more than the traction limit of its worst release surface and load case.
 * Computed on the unsaved draft. Where the band is empty, no single map can satisfy both, and it says why.
 */
import { useMemo } from 'react'
import type { MapTable, UnitSet } from '@/maps'
import { fullPedalBand } from '@/physics/gradeability'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'
import type { VehicleParams } from '@/physics/vehicle'
import type { ReleaseConditions } from '@/db/schema'

const STATUS = { 'in-band': 'in the band', 'below-needed': 'too little to climb', 'above-allowed': 'beyond the traction limit', 'no-band': 'no band' } as const

export function GradeBand({ table, vehicle, conditions, units: u }: { table: MapTable; vehicle: VehicleParams | null; conditions: ReleaseConditions | null | undefined; units: UnitSet }) {
  const band = useMemo(() => {
    if (!vehicle || !conditions || table.kind !== 'drive') return null
    try {
      return fullPedalBand(vehicle, table, conditions, conditions)
    } catch {
      return null // a draft the physics refuses shows its findings instead
    }
  }, [table, vehicle, conditions])
  if (!band || !conditions) return null
  const grade = conditions.startGradePct ?? conditions.holdGradePct
  const t = (nm: number) => `${Math.round(u.torqueOut(nm)).toLocaleString('en-GB')}`
  const empty = band.filter((c) => c.empty)
  return (
    <section className="space-y-1" aria-labelledby="grade-band-heading" data-testid="grade-band">
      <h3 id="grade-band-heading" className="text-sm font-semibold">Full-pedal row against the grade and the tyres ({u.torque})</h3>
      <p className="text-xs text-slate-600">
        At least the torque to climb {grade} % laden; at most the traction limit of the worst release surface and load case (flat road).
      </p>
      <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Full-pedal band by speed">
        <table className="text-xs tabular-nums">
          <thead>
            <tr className="text-left">
              <th scope="col" className="pr-3">Speed ({u.speed})</th>
              {band.map((c) => <th key={c.speedKmh} scope="col" className="px-1 text-right">{Math.round(u.speedOut(c.speedKmh))}</th>)}
            </tr>
          </thead>
          <tbody>
            <tr><th scope="row" className="pr-3 text-left font-normal">Needed</th>{band.map((c) => <td key={c.speedKmh} className="px-1 text-right">{t(c.neededNm)}</td>)}</tr>
            <tr><th scope="row" className="pr-3 text-left font-normal">Map at full pedal</th>{band.map((c) => <td key={c.speedKmh} className={`px-1 text-right ${c.status === 'in-band' ? '' : 'font-semibold text-danger'}`} title={STATUS[c.status]}>{t(c.mapNm)}</td>)}</tr>
            <tr><th scope="row" className="pr-3 text-left font-normal">Tyres allow</th>{band.map((c) => <td key={c.speedKmh} className="px-1 text-right" title={`${surfaceLabel(c.worstSurface)}, ${loadCaseLabel(c.worstLoadCase)}`}>{t(c.allowedNm)}</td>)}</tr>
          </tbody>
        </table>
      </div>
      {empty.length > 0 && (
        <p className="text-xs text-danger" data-testid="grade-band-empty">
          No single map can satisfy both at {empty.map((c) => `${Math.round(u.speedOut(c.speedKmh))} ${u.speed}`).join(', ')}: climbing {grade} % laden needs more torque than the
          tyres hold on {surfaceLabel(empty[0].worstSurface)} ({loadCaseLabel(empty[0].worstLoadCase)}). The remedy lies outside this row: traction control, more load on the
          driven axle, other tyres, or different release conditions.
        </p>
      )}
    </section>
  )
}

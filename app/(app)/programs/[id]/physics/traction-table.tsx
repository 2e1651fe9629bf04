'use client'
/** Traction and regen limits of the drive axle per surface and load case, from the traction route. */
import { useQuery } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import { LOAD_CASE_LABELS } from '@/physics/load-cases'
import { tableNumber, type UnitSet } from '@/maps'
import type { TractionRow } from '@/app/_lib/physics/traction'

export function TractionTable({ programId, initial, units: u }: { programId: number; initial: TractionRow[]; units: UnitSet }) {
  const q = useQuery({
    queryKey: ['traction', programId],
    queryFn: () => api<{ rows: TractionRow[] }>(`/api/programs/${programId}/traction`).then((r) => r.rows),
    initialData: initial,
    staleTime: Infinity,
  })
  const rows = q.data
  return (
    <section className="card space-y-2">
      <h2 className="text-lg font-semibold">Traction limits</h2>
      <p className="text-sm text-slate-600">
        Largest force the drive axle can put on the road before the tyres pass their peak, with the load transfer of that force
        (level road, lowest gear). For a tandem it is the group’s total when the axle that limits first — the lighter one of an
        open 6×4, the driven one of a 6×2 — reaches its peak. “Motor can give” is the motor and battery limit at {tableNumber(u.speedOut(5))} {u.speed}.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full text-sm tabular-nums" data-testid="traction-table">
          <thead className="text-left text-xs uppercase text-slate-500">
            <tr>
              <th className="py-1">Surface</th>
              <th>Load case</th>
              <th className="text-right">Drive limit (kN)</th>
              <th className="text-right">Motor torque at limit ({u.torque})</th>
              <th className="text-right">Motor can give ({u.torque})</th>
              <th className="text-right">Regen limit (kN)</th>
              <th className="text-right">Regen torque at limit ({u.torque})</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => {
              const spins = r.lowSpeedEnvelopeNm > r.driveTorqueAtLimitNm
              return (
                <tr key={`${r.surface}-${r.loadCase}`} className="border-t border-line">
                  <td className="py-1">
                    {r.surfaceLabel} <span className="text-slate-500">μ {Math.abs(r.tyreMu - r.peakMu) < 5e-4 ? r.peakMu : `${r.peakMu} → ${tableNumber(r.tyreMu, 3)} at this load`}, peak slip {tableNumber(r.tyrePeakSlip, 3)}</span>
                  </td>
                  <td>{LOAD_CASE_LABELS[r.loadCase]}</td>
                  <td className="text-right">{tableNumber(r.driveLimitKN)}{r.driveLimitedBy === 'steer-axle-lift' ? ' (steer axle lifts)' : ''}</td>
                  <td className={`text-right ${spins ? 'font-semibold text-danger' : ''}`} title={spins ? 'Full pedal at low speed can spin the drive axle' : undefined}>
                    {tableNumber(u.torqueOut(r.driveTorqueAtLimitNm), 0)}
                  </td>
                  <td className="text-right">{tableNumber(u.torqueOut(r.lowSpeedEnvelopeNm), 0)}</td>
                  <td className="text-right">{tableNumber(r.regenLimitKN)}</td>
                  <td className="text-right">{tableNumber(u.torqueOut(r.regenTorqueAtLimitNm), 0)}</td>
                </tr>
              )
            })}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-slate-500">Red: the motor can give more than the axle can transmit there, so a full-pedal launch would spin the wheels unless the map holds back.</p>
    </section>
  )
}

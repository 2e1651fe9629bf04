/** Lift-off deceleration and drive envelope at the program's declared battery corners (server-rendered). */
import { tableNumber } from '@/maps'
import { LOAD_CASE_LABELS } from '@/physics/load-cases'
import { DRIVE_CHECK_KMH, type CornerRow } from '@/app/_lib/physics/battery-corners'

export function BatteryCornersTable({ rows, minDecelMps2, hasTable }: { rows: CornerRow[]; minDecelMps2?: number; hasTable: boolean }) {
  if (rows.length === 0) return null
  return (
    <section className="card space-y-3" aria-labelledby="corners-title" data-testid="battery-corners">
      <div>
        <h2 id="corners-title" className="text-lg font-semibold">Battery corners</h2>
        <p className="text-sm text-slate-600">
          The lift-off deceleration the driver would get from each regen map’s 0 % row when the pack is at a declared state of
          charge and temperature, next to the nominal pack’s (regen only, without rolling resistance and drag; lowest gear).
          {minDecelMps2 !== undefined ? ` Marked: below the minimum of ${tableNumber(minDecelMps2)} m/s² where the nominal pack reaches it.` : ' No minimum is declared, so nothing is marked.'}
          {!hasTable && ' The program has no battery power table: every corner is the nominal pack.'}
        </p>
      </div>
      {rows.map((r) => (
        <div key={r.corner.label} className="space-y-1">
          <h3 className="font-semibold">
            {r.corner.label} <span className="font-normal text-slate-600">({r.corner.socPct} %, {r.corner.temperatureC} °C): charge {tableNumber(r.chargeKW, 0)} kW, discharge {tableNumber(r.dischargeKW, 0)} kW; drive torque at {DRIVE_CHECK_KMH} km/h {tableNumber(r.driveEnvelopeNm, 0)} N·m (nominal {tableNumber(r.nominalDriveEnvelopeNm, 0)})</span>
          </h3>
          <div className="overflow-x-auto" tabIndex={0} role="region" aria-label={`Lift-off deceleration at ${r.corner.label}`}>
            <table className="w-full text-sm tabular-nums">
              <thead className="text-left text-xs uppercase text-slate-500">
                <tr>
                  <th className="py-1">Regen map · load case</th>
                  {r.liftOff[0]?.points.map((p) => <th key={p.speedKmh} className="text-right">{p.speedKmh} km/h</th>)}
                </tr>
              </thead>
              <tbody>
                {r.liftOff.map((l) => (
                  <tr key={`${l.mapName}-${l.loadCase}`} className="border-t border-line">
                    <td className="py-1">{l.mapName} r{l.revision} · {LOAD_CASE_LABELS[l.loadCase]}</td>
                    {l.points.map((p) => (
                      <td
                        key={p.speedKmh}
                        className={`text-right ${p.belowMin ? 'font-semibold text-danger' : ''}`}
                        title={`${p.belowMin ? 'Below the minimum. ' : ''}Nominal pack ${p.nominalDecelMps2.toFixed(2)} m/s²; limited by the ${p.limitedBy}`}
                      >
                        {p.decelMps2.toFixed(2)}{p.belowMin ? ' (below)' : ''}
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </div>
      ))}
      <p className="text-xs text-slate-500">Lift-off deceleration in m/s². Hover a cell for the nominal pack’s figure and what limits it.</p>
    </section>
  )
}

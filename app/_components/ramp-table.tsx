import type { RampLimits } from '@/maps/ramps'

const n = (x: number) => x.toLocaleString('en')

/** Ramp limits as a read-only table: one row per speed breakpoint, then the lash band. */
export function RampTable({ limits }: { limits: RampLimits }) {
  return (
    <div className="space-y-2">
      <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Ramp rates by road speed">
        <table className="text-sm">
          <thead>
            <tr className="text-left">
              <th scope="col" className="pr-4">Road speed (km/h)</th>
              <th scope="col" className="pr-4">Tip-in (N·m/s)</th>
              <th scope="col">Tip-out (N·m/s)</th>
            </tr>
          </thead>
          <tbody>
            {limits.speedKmh.map((s, i) => (
              <tr key={i}>
                <td className="pr-4 tabular-nums">{s}</td>
                <td className="pr-4 tabular-nums">{n(limits.tipInNmPerS[i])}</td>
                <td className="tabular-nums">{n(limits.tipOutNmPerS[i])}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-sm">
        Lash band ±{n(limits.lashBandNm)} N·m, crossed at {n(limits.lashRateNmPerS)} N·m/s.
      </p>
    </div>
  )
}

import type { ReplayResult } from '@/physics/replay'

/** Where on the candidate's drive map it asked for more: seconds per cell (pedal rows × speed columns), worst excess on hover. */
export function ReplayGrid({ grid }: { grid: NonNullable<ReplayResult['grid']> }) {
  const max = Math.max(0, ...grid.seconds.flat())
  return (
    <section className="space-y-2" aria-labelledby="replay-grid-heading">
      <h2 id="replay-grid-heading" className="text-lg font-semibold">Where the candidate asks for more, on its drive map</h2>
      <p className="text-sm text-slate-600">Seconds of the drive spent in each cell (nearest breakpoints of the logged pedal and speed) while the candidate asked for more than was driven. Empty: never.</p>
      <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Replay difference on the map grid">
        <table className="text-xs tabular-nums" data-testid="replay-grid">
          <thead>
            <tr>
              <th scope="col" className="px-1 text-left">Pedal \ km/h</th>
              {grid.colAxis.map((c) => <th key={c} scope="col" className="px-1">{c}</th>)}
            </tr>
          </thead>
          <tbody>
            {[...grid.rowAxis.keys()].reverse().map((r) => (
              <tr key={r}>
                <th scope="row" className="px-1 text-left">{grid.rowAxis[r]} %</th>
                {grid.colAxis.map((_, c) => {
                  const sec = grid.seconds[r][c]
                  // A light tint under dark text at every level (text contrast stays ≥ 4.5:1; the number says the amount).
                  const shade = max > 0 && sec > 0 ? 0.1 + 0.35 * (sec / max) : 0
                  return (
                    <td key={c} className="border border-line px-1 text-center" style={shade ? { background: `rgba(180, 35, 24, ${shade.toFixed(2)})`, color: '#111827' } : undefined}
                      title={sec > 0 ? `${sec.toFixed(1)} s, up to ${Math.round(grid.worstExcessNm[r][c])} N·m more` : undefined}>
                      {sec > 0 ? sec.toFixed(1) : ''}
                    </td>
                  )
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  )
}

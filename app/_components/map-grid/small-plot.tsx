'use client'
/**
 * A small inline SVG of one row (torque against speed) or one column (torque against pedal),
 * with the motor limit for reference. Hand-drawn SVG instead of a plotting library keeps the
 * editor page light.
 */
import { chargeLimitTorqueAt, motorEnvelopeAt, type MapLimits, type MapTable, humanNumber, type UnitSet } from '@/maps'
import { extent, linear, niceTicks } from './plot-scale'

export interface SmallPlotProps {
  table: MapTable
  units: UnitSet
  limits: MapLimits | null
  along: 'speed' | 'pedal'
  /** Table row (along speed) or column (along pedal) to draw. */
  index: number
}

const W = 520
const H = 220
const M = { l: 58, r: 12, t: 14, b: 38 }

/** The torque limit at a speed: motor envelope for drive, the braking limit (also battery charge) for regen. */
function limitAt(table: MapTable, limits: MapLimits, kmh: number): number {
  const env = motorEnvelopeAt(limits, kmh)
  return table.kind === 'regen' ? Math.min(env, chargeLimitTorqueAt(limits, kmh)) : env
}

export function SmallPlot({ table, units: u, limits, along, index }: SmallPlotProps) {
  const bySpeed = along === 'speed'
  const xs = bySpeed ? table.colAxis.map(u.speedOut) : table.rowAxis
  const ys = (bySpeed ? table.values[index] : table.values.map((r) => r[index])).map(u.torqueOut)
  const maxKmh = table.colAxis[table.colAxis.length - 1]
  const limitPts: [number, number][] = !limits
    ? []
    : bySpeed
      ? Array.from({ length: 81 }, (_, i) => (maxKmh * i) / 80).map((k) => [u.speedOut(k), u.torqueOut(limitAt(table, limits, k))])
      : [table.rowAxis[0], table.rowAxis[table.rowAxis.length - 1]].map((p) => [p, u.torqueOut(limitAt(table, limits, table.colAxis[index]))])
  const [y0, y1] = extent([...ys, ...limitPts.map((p) => p[1])])
  const x = linear(xs[0], xs[xs.length - 1], M.l, W - M.r)
  const y = linear(y0, y1, H - M.b, M.t)
  const path = (pts: [number, number][]) => pts.map(([a, b], i) => `${i ? 'L' : 'M'}${x(a).toFixed(1)},${y(b).toFixed(1)}`).join(' ')
  const pts = xs.map((v, i): [number, number] => [v, ys[i]])
  const what = bySpeed ? `${humanNumber(table.rowAxis[index])} % ${table.kind === 'regen' ? 'brake ' : ''}pedal` : `${humanNumber(u.speedOut(table.colAxis[index]))} ${u.speed}`
  const limitName = table.kind === 'regen' ? 'braking limit (motor and battery charge)' : 'motor limit'

  return (
    <figure className="card p-3" aria-label="Plot of the selected row or column">
      <figcaption className="mb-1 text-xs text-slate-600">
        Torque at {what} · <span className="text-accent">map</span>
        {limits && <span className="text-danger"> · {limitName}</span>}
      </figcaption>
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full max-w-xl" role="img" aria-label={`Torque against ${bySpeed ? 'speed' : 'pedal'} at ${what}`}>
        {niceTicks(y0, y1).map((t) => (
          <g key={`y${t}`}>
            <line x1={M.l} x2={W - M.r} y1={y(t)} y2={y(t)} stroke="#e5e7eb" />
            <text x={M.l - 4} y={y(t) + 3} fontSize={10} textAnchor="end" fill="#475569">{humanNumber(t)}</text>
          </g>
        ))}
        {niceTicks(xs[0], xs[xs.length - 1]).map((t) => (
          <text key={`x${t}`} x={x(t)} y={H - M.b + 14} fontSize={10} textAnchor="middle" fill="#475569">{humanNumber(t)}</text>
        ))}
        <line x1={M.l} x2={W - M.r} y1={H - M.b} y2={H - M.b} stroke="#94a3b8" />
        <line x1={M.l} x2={M.l} y1={M.t} y2={H - M.b} stroke="#94a3b8" />
        {limitPts.length > 0 && <path d={path(limitPts)} fill="none" stroke="#b42318" strokeDasharray="5 3" strokeWidth={1.5} />}
        <path d={path(pts)} fill="none" stroke="#0f6b5c" strokeWidth={2} />
        {pts.map(([a, b], i) => <circle key={i} cx={x(a)} cy={y(b)} r={2.5} fill="#0f6b5c" />)}
        <text x={(M.l + W - M.r) / 2} y={H - 6} fontSize={11} textAnchor="middle" fill="#334155">{bySpeed ? `road speed, ${u.speed}` : 'pedal position, %'}</text>
        <text x={12} y={(M.t + H - M.b) / 2} fontSize={11} textAnchor="middle" fill="#334155" transform={`rotate(-90 12 ${(M.t + H - M.b) / 2})`}>torque, {u.torque}</text>
      </svg>
    </figure>
  )
}

'use client'
/** The changed cells of a comparison or a proposal, largest change first, in the chosen units. */
import { useState } from 'react'
import { tableNumber, type UnitSet } from '@/maps'

export interface ChangeRow {
  pedalPct: number
  speedKmh: number
  before: number
  after: number
  /** Why the cell changed, for proposals. */
  note?: string
}

const FIRST = 25

export function ChangeTable({ rows, units: u, testId = 'change-table', empty = 'No cell changed.' }: { rows: ChangeRow[]; units: UnitSet; testId?: string; empty?: string }) {
  const [all, setAll] = useState(false)
  if (rows.length === 0) return <p className="text-sm text-slate-600" data-testid={testId}>{empty}</p>
  const shown = all ? rows : rows.slice(0, FIRST)
  const hasNote = rows.some((r) => r.note)
  return (
    <div className="space-y-2">
      {/* Focusable, so the keyboard can scroll a long list (and a wide one on a phone). */}
      <div className="max-h-96 overflow-auto rounded border border-line" tabIndex={0} role="region" aria-label="Changed cells">
        <table className="w-full text-sm tabular-nums" data-testid={testId}>
          <thead className="sticky top-0 bg-paper text-left text-xs uppercase text-slate-500">
            <tr>
              <th className="px-2 py-1">Pedal</th>
              <th className="px-2">Speed ({u.speed})</th>
              <th className="px-2 text-right">Before ({u.torque})</th>
              <th className="px-2 text-right">After ({u.torque})</th>
              <th className="px-2 text-right">Change</th>
              <th className="px-2 text-right">%</th>
              {hasNote && <th className="px-2">Why</th>}
            </tr>
          </thead>
          <tbody>
            {shown.map((r) => {
              const d = r.after - r.before
              return (
                <tr key={`${r.pedalPct}-${r.speedKmh}`} className="border-t border-line">
                  <td className="px-2 py-0.5">{tableNumber(r.pedalPct)} %</td>
                  <td className="px-2">{tableNumber(u.speedOut(r.speedKmh))}</td>
                  <td className="px-2 text-right">{tableNumber(u.torqueOut(r.before))}</td>
                  <td className="px-2 text-right">{tableNumber(u.torqueOut(r.after))}</td>
                  <td className={`px-2 text-right font-medium ${d < 0 ? 'text-danger' : 'text-accent'}`}>{d > 0 ? '+' : ''}{tableNumber(u.torqueOut(d))}</td>
                  <td className="px-2 text-right">{r.before !== 0 ? `${d > 0 ? '+' : ''}${tableNumber((100 * d) / Math.abs(r.before))}` : '—'}</td>
                  {hasNote && <td className="px-2 text-slate-600">{r.note}</td>}
                </tr>
              )
            })}
          </tbody>
        </table>
      </div>
      {rows.length > FIRST && (
        <button type="button" className="btn" onClick={() => setAll(!all)}>
          {all ? `Show the first ${FIRST}` : `Show all ${rows.length} changes`}
        </button>
      )}
    </div>
  )
}

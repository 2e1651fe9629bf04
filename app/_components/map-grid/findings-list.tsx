'use client'
/** The validation findings beside the grid; clicking one selects the cell it is about. */
import { memo } from 'react'
import type { Finding } from '@/maps'
import { findingCell } from './finding-marks'

export interface FindingsListProps {
  findings: Finding[]
  describe: (f: Finding) => string
  onPick?: (row: number, col: number) => void
}

const LIMIT = 200

/**
 * One finding, by plain values: an edit makes a new findings list, but most findings read the same
 * as before, and React then skips them (each edit re-rendered up to 200 buttons).
 */
const FindingItem = memo(function FindingItem({ error, rule, text, row, col, onPick }: { error: boolean; rule: string; text: string; row: number; col: number; onPick?: (row: number, col: number) => void }) {
  return (
    <li>
      <button
        type="button"
        onClick={() => onPick?.(row, col)}
        className={`w-full rounded border-l-4 px-2 py-1 text-left hover:bg-slate-50 ${error ? 'border-danger bg-red-50/60' : 'border-warn bg-amber-50/60'}`}
      >
        <span className={`mr-1 font-semibold ${error ? 'text-danger' : 'text-warn'}`}>{error ? 'Error' : 'Warning'}</span>
        <span className="text-slate-500">[{rule}]</span> {text}
      </button>
    </li>
  )
})

export function FindingsList({ findings, describe, onPick }: FindingsListProps) {
  const errors = findings.filter((f) => f.severity === 'error').length
  return (
    <section aria-label="Findings" className="card space-y-2 p-3">
      <h2 className="text-sm font-semibold">
        Findings{' '}
        <span className="font-normal text-slate-600">
          {errors} error{errors === 1 ? '' : 's'}, {findings.length - errors} warning{findings.length - errors === 1 ? '' : 's'}
        </span>
      </h2>
      {findings.length === 0 && <p className="text-sm text-slate-600">No rule is broken.</p>}
      <ul className="max-h-[28rem] space-y-1 overflow-y-auto text-xs" data-testid="findings-list">
        {findings.slice(0, LIMIT).map((f, i) => {
          const { row, col } = findingCell(f)
          return <FindingItem key={i} error={f.severity === 'error'} rule={f.rule} text={describe(f)} row={row} col={col} onPick={onPick} />
        })}
      </ul>
      {findings.length > LIMIT && <p className="text-xs text-slate-600">…and {findings.length - LIMIT} more.</p>}
    </section>
  )
}

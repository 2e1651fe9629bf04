'use client'
import { useId, useState } from 'react'
import { CHANNEL_ROWS, mappingProblems, toMapping, type ChannelRow, type Choices } from '@/app/_lib/reports/column-mapping/column-choices'

/** Rows shown at once; the rest (second drive axle, motor, battery, yaw) fold away on a phone. */
const FIRST: ReadonlySet<string> = new Set(['time', 'roadSpeed', 'accelPedal', 'wheel', 'wheelLeft', 'wheelRight', 'brakePedal'])

/**
 * Pick, for each quantity Mapwright reads, the header in the driver's file that holds it (and its
 * unit where there is a choice). The headers come from the file's own first line, read in the browser.
 */
export function LogColumnMapping(props: {
  fileName: string
  headers: readonly string[]
  initial: Choices
  /** The set holds no drive map: regen occupancy needs the brake pedal. */
  needsBrake: boolean
  submitLabel: string
  busy: boolean
  onSubmit: (mapping: Record<string, string>) => void
  onCancel: () => void
}) {
  const [choices, setChoices] = useState<Choices>(props.initial)
  const [tried, setTried] = useState(false)
  const problems = mappingProblems(choices, props.needsBrake)
  const row = (r: ChannelRow) => <ChannelPicker key={r.channel} row={r} headers={props.headers} needsBrake={props.needsBrake} choices={choices} onChange={setChoices} />
  return (
    <form
      className="space-y-2 rounded-md border border-line p-2"
      aria-label={`Columns of ${props.fileName}`}
      onSubmit={(e) => {
        e.preventDefault()
        setTried(true)
        if (problems.length === 0) props.onSubmit(toMapping(choices))
      }}
    >
      <p className="text-sm break-words">
        Which column of <strong>{props.fileName}</strong> holds each quantity? The names are the file’s own first line, read on this device.
      </p>
      <div className="space-y-2">{CHANNEL_ROWS.filter((r) => FIRST.has(r.channel)).map(row)}</div>
      <details className="text-sm">
        <summary className="cursor-pointer text-slate-600">More columns (optional)</summary>
        <div className="mt-2 space-y-2">{CHANNEL_ROWS.filter((r) => !FIRST.has(r.channel)).map(row)}</div>
      </details>
      {tried && problems.length > 0 && (
        <ul role="alert" className="error-text list-disc pl-5 text-sm">
          {problems.map((p) => <li key={p}>{p}</li>)}
        </ul>
      )}
      <p className="flex flex-wrap gap-2">
        <button type="submit" className="btn-primary" disabled={props.busy}>{props.submitLabel}</button>
        <button type="button" className="btn" onClick={props.onCancel}>Cancel</button>
      </p>
    </form>
  )
}

function requiredText(row: ChannelRow, needsBrake: boolean): string | null {
  if (row.required === 'yes') return 'required'
  if (row.required === 'wheel') return 'one wheel speed required'
  if (row.required === 'regen' && needsBrake) return 'required for this set'
  return null
}

function ChannelPicker(props: { row: ChannelRow; headers: readonly string[]; needsBrake: boolean; choices: Choices; onChange: (c: Choices) => void }) {
  const id = useId()
  const { row } = props
  const choice = props.choices[row.channel]
  const req = requiredText(row, props.needsBrake)
  const set = (header: string, column = choice?.column ?? row.columns[0].name) => {
    const next = { ...props.choices }
    if (header) next[row.channel] = { header, column }
    else delete next[row.channel]
    props.onChange(next)
  }
  return (
    // On a phone: the name over the header and unit side by side; wider, all three on one line.
    <div className="grid grid-cols-[minmax(0,1fr)_6rem] items-center gap-1 sm:grid-cols-[minmax(0,1fr)_12rem_7rem]">
      <label htmlFor={`${id}-h`} className="col-span-2 text-sm sm:col-span-1">
        {row.label} {req && <span className="text-xs font-semibold text-danger">({req})</span>}
      </label>
      <select id={`${id}-h`} className="field" aria-required={row.required === 'yes' || (row.required === 'regen' && props.needsBrake)} value={choice?.header ?? ''} onChange={(e) => set(e.target.value)}>
        <option value="">— not in this file —</option>
        {props.headers.map((h, i) => <option key={`${i}:${h}`} value={h}>{h || `(column ${i + 1}, no name)`}</option>)}
      </select>
      {row.columns.length > 1 ? (
        <select aria-label={`${row.label}: unit`} className="field" value={choice?.column ?? row.columns[0].name} disabled={!choice} onChange={(e) => set(choice?.header ?? '', e.target.value)}>
          {row.columns.map((c) => <option key={c.name} value={c.name}>{c.unit}</option>)}
        </select>
      ) : (
        <span className="text-xs text-slate-600">{row.columns[0].unit}</span>
      )}
    </div>
  )
}

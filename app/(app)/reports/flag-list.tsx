'use client'
import type { FieldArrayWithId, UseFormReturn } from 'react-hook-form'
import type { z } from 'zod'
import { SEVERITY_LABELS, type reportInputSchema } from '@/app/_schemas/report'
import type { ReportFormIn } from './report-form'

type Form = UseFormReturn<ReportFormIn, unknown, z.output<typeof reportInputSchema>>

const MAP_LABELS = { drive: 'Drive map', regen: 'Regen map' } as const

/** The flagged points, each on a map of the set, with what happened and how bad; severity 4 opens a safety concern. */
export function FlagList(props: { form: Form; fields: FieldArrayWithId<ReportFormIn, 'flags'>[]; maps: readonly ('drive' | 'regen')[]; onRemove: (i: number) => void; onAdd: () => void }) {
  const { register, formState } = props.form
  return (
    <div className="space-y-2">
      {props.fields.map((f, i) => {
        const e = formState.errors.flags?.[i]
        return (
          <div key={f.id} className="grid grid-cols-2 gap-2 rounded-md border border-line p-2 sm:grid-cols-6" data-testid={`flag-${i}`}>
            {/* On a phone the map and severity take a full row each, so "4 — Safety concern" is never cut. */}
            <div className="col-span-2">
              <label htmlFor={`flag-${i}-map`} className="label">Map</label>
              <select id={`flag-${i}-map`} className="field" {...register(`flags.${i}.map`)}>
                {/* A flag from a draft older than sets names no map; one on a map this set lacks stays visible so the driver can move it. */}
                {!f.map && <option value="">Choose…</option>}
                {(['drive', 'regen'] as const).filter((k) => props.maps.includes(k) || f.map === k).map((k) => (
                  <option key={k} value={k}>{MAP_LABELS[k]}</option>
                ))}
              </select>
            </div>
            <div className="col-span-2">
              <label htmlFor={`flag-${i}-severity`} className="label">Severity</label>
              <select id={`flag-${i}-severity`} className="field" {...register(`flags.${i}.severity`, { valueAsNumber: true })}>
                {Object.entries(SEVERITY_LABELS).map(([n, label]) => (
                  <option key={n} value={n}>{n} — {label}</option>
                ))}
              </select>
            </div>
            <div>
              <label htmlFor={`flag-${i}-pedal`} className="label">Pedal %</label>
              <input id={`flag-${i}-pedal`} inputMode="decimal" className="field" {...register(`flags.${i}.pedalPct`, { valueAsNumber: true })} />
            </div>
            <div>
              <label htmlFor={`flag-${i}-speed`} className="label">km/h</label>
              <input id={`flag-${i}-speed`} inputMode="decimal" className="field" {...register(`flags.${i}.speedKmh`, { valueAsNumber: true })} />
            </div>
            <div className="col-span-2 sm:col-span-6">
              <label htmlFor={`flag-${i}-what`} className="label">What happened</label>
              <input id={`flag-${i}-what`} className="field" {...register(`flags.${i}.what`)} />
            </div>
            {e && <p className="error-text col-span-full">{e.map?.message ?? e.what?.message ?? e.pedalPct?.message ?? e.speedKmh?.message ?? e.severity?.message}</p>}
            <button type="button" className="text-left text-xs text-danger underline col-span-full" onClick={() => props.onRemove(i)}>Remove this flag</button>
          </div>
        )
      })}
      <button type="button" className="btn" onClick={props.onAdd}>Add a flag by hand</button>
    </div>
  )
}

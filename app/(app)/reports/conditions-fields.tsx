'use client'
import type { UseFormReturn } from 'react-hook-form'
import { loadCaseLabel, SURFACES, SURFACE_IDS } from '@/physics'
import type { ReportFormIn } from './report-form'
import type { z } from 'zod'
import type { reportInputSchema } from '@/app/_schemas/report'

type Form = UseFormReturn<ReportFormIn, unknown, z.output<typeof reportInputSchema>>

/** Date, vehicle, route and conditions: the context a reader needs to weigh the report. */
export function ConditionsFields({ form, loadCases }: { form: Form; loadCases: string[] }) {
  const { register, formState } = form
  const e = formState.errors
  const err = (m?: string) => (m ? <p className="error-text">{m}</p> : null)
  return (
    <section className="card grid gap-3 sm:grid-cols-2">
      <h2 className="font-semibold sm:col-span-2">Conditions</h2>
      <div>
        <label htmlFor="drivenOn" className="label">Date driven</label>
        <input id="drivenOn" type="date" className="field" {...register('drivenOn')} />
        {err(e.drivenOn?.message)}
      </div>
      <div>
        <label htmlFor="vehicleUnit" className="label">Vehicle unit</label>
        <input id="vehicleUnit" className="field" placeholder="fleet number" {...register('vehicleUnit')} />
        {err(e.vehicleUnit?.message)}
      </div>
      <div className="sm:col-span-2">
        <label htmlFor="route" className="label">Route or course</label>
        <input id="route" className="field" {...register('route')} />
        {err(e.route?.message)}
      </div>
      <div>
        <label htmlFor="surface" className="label">Road surface</label>
        <select id="surface" className="field" {...register('surface')}>
          {SURFACE_IDS.map((id) => (
            <option key={id} value={id}>{SURFACES[id].label}</option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="weather" className="label">Weather</label>
        <input id="weather" className="field" placeholder="e.g. light rain" {...register('weather')} />
        {err(e.weather?.message)}
      </div>
      <div>
        <label htmlFor="ambientC" className="label">Ambient temperature (°C)</label>
        <input id="ambientC" inputMode="decimal" className="field" {...register('ambientC', { valueAsNumber: true })} />
        {err(e.ambientC?.message)}
      </div>
      <div>
        <label htmlFor="loadCase" className="label">Load case</label>
        <select id="loadCase" className="field" {...register('loadCase')}>
          {loadCases.map((c) => (
            <option key={c} value={c}>{loadCaseLabel(c)}</option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="payloadKg" className="label">Payload (kg)</label>
        <input id="payloadKg" inputMode="decimal" className="field" {...register('payloadKg', { valueAsNumber: true })} />
        {err(e.payloadKg?.message)}
      </div>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" {...register('trailer')} /> Trailer coupled
      </label>
      {err(e.trailer?.message)}
      <div className="sm:col-span-2">
        <label htmlFor="comments" className="label">How it felt</label>
        <textarea id="comments" rows={4} className="field" {...register('comments')} />
      </div>
    </section>
  )
}

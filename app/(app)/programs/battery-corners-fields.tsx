'use client'
/** Battery corners and the minimum lift-off deceleration of the release conditions (both optional). */
import { useFieldArray, useFormState, type Control, type UseFormRegister } from 'react-hook-form'
import type { z } from 'zod'
import { SUGGESTED_BATTERY_CORNERS, type programInputSchema } from '@/app/_schemas/program'
import { ScaledNumberInput } from './scaled-number-input'

type FormIn = z.input<typeof programInputSchema>
type FormOut = z.output<typeof programInputSchema>

const toNumber = (v: unknown) => (v === '' || v === null || v === undefined ? NaN : Number(v))

export function BatteryCornersFields({ control, register }: { control: Control<FormIn, unknown, FormOut>; register: UseFormRegister<FormIn> }) {
  const { fields, append, remove } = useFieldArray({ control, name: 'releaseConditions.batteryCorners' })
  const { errors } = useFormState({ control, name: 'releaseConditions.batteryCorners' })
  const rowErrors = errors.releaseConditions?.batteryCorners
  return (
    <fieldset className="space-y-2">
      <legend className="label">Battery corners</legend>
      <p className="text-sm text-slate-600">
        Battery states at which the regen check shows the lift-off deceleration the driver would get (charge power from the
        program’s power table). With a minimum below, a corner that takes lift-off under it where the nominal pack reaches it is a
        release finding.
      </p>
      {fields.map((f, i) => {
        const e = Array.isArray(rowErrors) ? rowErrors[i] : undefined
        return (
          <div key={f.id} className="flex flex-wrap items-end gap-3">
            <div>
              <label htmlFor={`corner-${i}-label`} className="label">Name</label>
              <input id={`corner-${i}-label`} className="field" {...register(`releaseConditions.batteryCorners.${i}.label`)} />
            </div>
            <div>
              <label htmlFor={`corner-${i}-soc`} className="label">State of charge <span className="normal-case text-slate-500">(%)</span></label>
              <input id={`corner-${i}-soc`} inputMode="decimal" className="field w-24" {...register(`releaseConditions.batteryCorners.${i}.socPct`, { setValueAs: toNumber })} />
            </div>
            <div>
              <label htmlFor={`corner-${i}-temp`} className="label">Battery temperature <span className="normal-case text-slate-500">(°C)</span></label>
              <input id={`corner-${i}-temp`} inputMode="decimal" className="field w-24" {...register(`releaseConditions.batteryCorners.${i}.temperatureC`, { setValueAs: toNumber })} />
            </div>
            <button type="button" className="btn" onClick={() => remove(i)}>Remove {f.label || `corner ${i + 1}`}</button>
            {e && ['label', 'socPct', 'temperatureC'].map((k) => e[k as 'label']?.message).filter(Boolean).map((m) => <p key={m} className="error-text w-full">{m}</p>)}
          </div>
        )
      })}
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn" onClick={() => append({ label: '', socPct: 50, temperatureC: 25 })}>Add a battery corner</button>
        {fields.length === 0 && (
          <button type="button" className="btn" onClick={() => SUGGESTED_BATTERY_CORNERS.forEach((c) => append(c))}>
            Add full-and-cold and half-and-warm
          </button>
        )}
      </div>
      <div className="max-w-xs">
        <ScaledNumberInput
          control={control}
          name="releaseConditions.minLiftOffDecelMps2"
          label="Minimum lift-off deceleration"
          unit="m/s²"
          hint="Empty = corners are shown, nothing is found."
        />
      </div>
    </fieldset>
  )
}

'use client'
import { Controller, type UseFormReturn } from 'react-hook-form'
import type { z } from 'zod'
import { RATING_KEYS, RATING_LABELS, RATING_SCALE, type reportInputSchema } from '@/app/_schemas/report'
import type { ReportFormIn } from './report-form'

type Form = UseFormReturn<ReportFormIn, unknown, z.output<typeof reportInputSchema>>

/** Five ratings on a 1–5 scale, as large tap targets. Controlled, so the value is a number, not the radio's string. */
export function RatingsFields({ form }: { form: Form }) {
  const errors = form.formState.errors.ratings
  return (
    <section className="card space-y-3">
      <h2 className="font-semibold">Ratings <span className="text-sm font-normal text-slate-500">(1 = unacceptable … 5 = good)</span></h2>
      {RATING_KEYS.map((k) => (
        <Controller
          key={k}
          control={form.control}
          name={`ratings.${k}`}
          render={({ field }) => (
            <fieldset>
              <legend className="label">{RATING_LABELS[k]}</legend>
              <div className="flex gap-2">
                {RATING_SCALE.map((n) => (
                  <label key={n} className="flex h-10 w-10 cursor-pointer items-center justify-center rounded-md border border-line text-sm has-[:checked]:border-accent has-[:checked]:bg-accent has-[:checked]:text-white">
                    <input type="radio" name={field.name} value={n} className="sr-only" aria-label={`${RATING_LABELS[k]} ${n}`} checked={field.value === n} onChange={() => field.onChange(n)} onBlur={field.onBlur} />
                    {n}
                  </label>
                ))}
              </div>
              {errors?.[k] && <p className="error-text">{errors[k]?.message}</p>}
            </fieldset>
          )}
        />
      ))}
    </section>
  )
}

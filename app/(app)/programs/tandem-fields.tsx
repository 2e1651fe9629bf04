'use client'
/** Tandem details of the program form: shown for 6×4 and 6×2; empty fields take the documented defaults. */
import { useWatch, type Control, type UseFormRegister } from 'react-hook-form'
import type { z } from 'zod'
import type { programInputSchema } from '@/app/_schemas/program'
import { ScaledNumberInput } from './scaled-number-input'

type FormIn = z.input<typeof programInputSchema>
type FormOut = z.output<typeof programInputSchema>

// An empty choice stores nothing, so the physics applies its default (docs/physics.md §6a).
const orUndefined = (v: unknown) => (v === '' || v === null ? undefined : v)

export function TandemFields({ control, register }: { control: Control<FormIn, unknown, FormOut>; register: UseFormRegister<FormIn> }) {
  const layout = useWatch({ control, name: 'params.axleLayout' })
  if (layout !== '6x4' && layout !== '6x2') return null
  return (
    <section className="card" aria-labelledby="tandem-title">
      <h2 id="tandem-title" className="font-semibold">Tandem drive group</h2>
      <p className="mb-3 text-sm text-slate-600">
        How the two rear axles share the drive force (docs/physics.md §6a). Empty fields keep the defaults: locked inter-axle
        differential, no inter-axle load transfer, forward axle driven with half the group load — the numbers of versions made
        before these fields existed.
      </p>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {layout === '6x4' && (
          <div>
            <label htmlFor="interAxleDifferential" className="label">Inter-axle differential</label>
            <select id="interAxleDifferential" className="field" aria-describedby="interAxleDifferential-hint" {...register('params.tandem.interAxleDifferential', { setValueAs: orUndefined })}>
              <option value="">Default (locked)</option>
              <option value="open">Open — equal torque; the lighter axle limits</option>
              <option value="locked">Locked — both axles turn together</option>
            </select>
            <p id="interAxleDifferential-hint" className="mt-1 text-xs text-slate-500">Open: the group delivers twice the lighter axle’s limit.</p>
          </div>
        )}
        {layout === '6x2' && (
          <>
            <div>
              <label htmlFor="drivenAxle" className="label">Driven axle of the tandem</label>
              <select id="drivenAxle" className="field" {...register('params.tandem.drivenAxle', { setValueAs: orUndefined })}>
                <option value="">Default (forward, tag axle behind)</option>
                <option value="forward">Forward (tag axle behind)</option>
                <option value="rear">Rear (pusher axle ahead)</option>
              </select>
            </div>
            <ScaledNumberInput
              control={control}
              name="params.tandem.drivenLoadShare"
              label="Driven axle’s share of the group load"
              unit="%"
              scale={0.01}
              hint="Empty = 50 %. A load-shift system that unloads the tag axle raises it."
            />
          </>
        )}
        <ScaledNumberInput
          control={control}
          name="params.tandem.interAxleTransfer"
          label="Inter-axle load transfer"
          unit="N per N of drive force"
          hint="Load moved onto the rear tandem axle per newton of drive force (negative: onto the forward one); reverses in regen. From the suspension maker or a measurement. Empty = 0."
        />
      </div>
    </section>
  )
}

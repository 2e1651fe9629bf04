'use client'
/** Which speed the controller looks the maps up on (physics/vehicle.ts mapSpeedSource); blank = road speed. */
import type { UseFormRegister } from 'react-hook-form'
import type { z } from 'zod'
import type { programInputSchema } from '@/app/_schemas/program'

type FormIn = z.input<typeof programInputSchema>

// An empty choice stores nothing, so the physics applies its default (road speed).
const orUndefined = (v: unknown) => (v === '' || v === null ? undefined : v)

export const MAP_SPEED_LABELS = { road: 'Road speed (non-driven axle or satellite positioning)', 'driven-wheel': 'Driven-wheel speed (from the motor speed)' } as const

export function MapSpeedField({ register }: { register: UseFormRegister<FormIn> }) {
  return (
    <div>
      <label htmlFor="mapSpeedSource" className="label">Speed the maps are looked up on</label>
      <select id="mapSpeedSource" className="field" aria-describedby="mapSpeedSource-hint" {...register('params.mapSpeedSource', { setValueAs: orUndefined })}>
        <option value="">Default (road speed)</option>
        <option value="road">{MAP_SPEED_LABELS.road}</option>
        <option value="driven-wheel">{MAP_SPEED_LABELS['driven-wheel']}</option>
      </select>
      <p id="mapSpeedSource-hint" className="mt-0.5 text-xs text-slate-600">
        Driven-wheel speed rises when the wheels spin, so a map whose torque falls with speed then asks for less: a spin on snow
        partly limits itself. Road speed does not see the spin. Neither is traction control.
      </p>
    </div>
  )
}

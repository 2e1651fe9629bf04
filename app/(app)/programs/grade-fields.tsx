'use client'
/** Startability and gradeability requirements of the program form (release conditions); blank = not checked. */
import type { Control } from 'react-hook-form'
import type { z } from 'zod'
import type { programInputSchema } from '@/app/_schemas/program'
import { ScaledNumberInput } from './scaled-number-input'

type FormIn = z.input<typeof programInputSchema>
type FormOut = z.output<typeof programInputSchema>

export function GradeFields({ control }: { control: Control<FormIn, unknown, FormOut> }) {
  return (
    <fieldset className="grid max-w-3xl gap-4 sm:grid-cols-3">
      <legend className="label">Start and hold on grade, laden (blank: not checked)</legend>
      <ScaledNumberInput
        control={control}
        name="releaseConditions.startGradePct"
        label="Steepest grade to start on"
        unit="%"
        hint="Rise per 100 m of run (10 % ≈ 5.7°). The drive map at full pedal and 0 km/h must give the torque, within the motor and the dry-road tyres."
      />
      <ScaledNumberInput control={control} name="releaseConditions.holdGradePct" label="Grade to hold" unit="%" hint="With the speed beside it: the map at full pedal must hold that speed on this grade." />
      <ScaledNumberInput control={control} name="releaseConditions.holdSpeedKmh" label="Speed to hold on it" unit="km/h" hint="Drag at this speed is added to grade and rolling resistance." />
    </fieldset>
  )
}

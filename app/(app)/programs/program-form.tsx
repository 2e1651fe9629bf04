'use client'
import { useRouter } from 'next/navigation'
import { useForm, useWatch, Controller } from 'react-hook-form'
import { zodResolver } from '@hookform/resolvers/zod'
import { useMutation, useQueryClient } from '@tanstack/react-query'
import { useState } from 'react'
import { z } from 'zod'
import { api, ApiError } from '@/app/_components/api-client'
import { programInputSchema } from '@/app/_schemas/program'
import { ScaledNumberInput } from './scaled-number-input'
import { TRAILER_FIELDS, TRAILER_START, VEHICLE_FIELDS } from './program-fields'

type FormIn = z.input<typeof programInputSchema>
type FormOut = z.output<typeof programInputSchema>

export function ProgramForm(props: { programId?: number; initial?: FormIn; readOnly?: boolean }) {
  const router = useRouter()
  const qc = useQueryClient()
  const [serverError, setServerError] = useState<string | null>(null)
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(programInputSchema),
    defaultValues: props.initial ?? { name: '', description: '', params: { axleLayout: '6x4', gearRatios: [1], trailer: null } as FormIn['params'] },
    mode: 'onBlur',
  })
  const { register, control, handleSubmit, setValue, formState } = form
  const hasTrailer = Boolean(useWatch({ control, name: 'params.trailer' }))

  const save = useMutation({
    mutationFn: (input: FormOut) =>
      props.programId
        ? api<{ program: { id: number } }>(`/api/programs/${props.programId}`, { method: 'PUT', json: input })
        : api<{ program: { id: number } }>('/api/programs', { method: 'POST', json: input }),
    onSuccess: async ({ program }) => {
      await qc.invalidateQueries({ queryKey: ['programs'] })
      router.push(`/programs/${program.id}?saved=1`)
      router.refresh()
    },
    onError: (e) => setServerError(e instanceof ApiError ? e.message : String(e)),
  })

  return (
    <form onSubmit={handleSubmit((v) => save.mutate(v))} className="space-y-5" noValidate>
      <fieldset disabled={props.readOnly} className="space-y-5">
        <div className="card grid gap-4 md:grid-cols-2">
          <div>
            <label htmlFor="name" className="label">Name</label>
            <input id="name" className="field" {...register('name')} />
            {formState.errors.name && <p className="error-text">{formState.errors.name.message}</p>}
          </div>
          <div>
            <label htmlFor="axleLayout" className="label">Axle layout</label>
            <select id="axleLayout" className="field" {...register('params.axleLayout')}>
              <option value="4x2">4×2</option>
              <option value="6x4">6×4 (tandem drive)</option>
            </select>
          </div>
          <div className="md:col-span-2">
            <label htmlFor="description" className="label">Description</label>
            <textarea id="description" rows={2} className="field" {...register('description')} />
          </div>
        </div>
        {VEHICLE_FIELDS.map((g) => (
          <section key={g.group} className="card">
            <h2 className="mb-3 font-semibold">{g.group}</h2>
            <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
              {g.fields.map((f) => (
                <ScaledNumberInput key={f.key} control={control} name={`params.${f.key}`} label={f.label} unit={f.unit} scale={f.scale} />
              ))}
              {g.group === 'Driveline and motor' && <GearRatiosInput control={control} />}
            </div>
          </section>
        ))}
        <section className="card">
          <label className="flex items-center gap-2 font-semibold">
            <input
              type="checkbox"
              checked={hasTrailer}
              onChange={(e) => setValue('params.trailer', e.target.checked ? TRAILER_START : null, { shouldDirty: true })}
            />
            Tractor with a semitrailer
          </label>
          {hasTrailer && (
            <div className="mt-3 grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
              {TRAILER_FIELDS.map((f) => (
                <ScaledNumberInput key={f.key} control={control} name={`params.trailer.${f.key}`} label={f.label} unit={f.unit} />
              ))}
            </div>
          )}
        </section>
      </fieldset>
      {serverError && <p role="alert" className="error-text text-sm">{serverError}</p>}
      {Object.keys(formState.errors).length > 0 && (
        <p role="alert" className="error-text text-sm">Some fields need attention; see the messages above.</p>
      )}
      {!props.readOnly && (
        <button type="submit" className="btn-primary" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : 'Save program'}
        </button>
      )}
    </form>
  )
}

function GearRatiosInput({ control }: { control: ReturnType<typeof useForm<FormIn, unknown, FormOut>>['control'] }) {
  return (
    <Controller
      control={control}
      name="params.gearRatios"
      render={({ field, fieldState }) => (
        <div>
          <label htmlFor="gearRatios" className="label">
            Gear ratios, lowest first <span className="normal-case text-slate-500">(comma-separated)</span>
          </label>
          <input
            id="gearRatios"
            className="field"
            defaultValue={(field.value ?? []).join(', ')}
            onBlur={field.onBlur}
            onChange={(e) => field.onChange(e.target.value.split(',').map((s) => (s.trim() === '' ? NaN : Number(s))))}
          />
          {fieldState.error && <p className="error-text">{fieldState.error.message ?? 'Each gear ratio must be a positive number'}</p>}
        </div>
      )}
    />
  )
}

'use client'
import { useRouter } from 'next/navigation'
import { useForm, useWatch, Controller, type Control } from 'react-hook-form'
import { zodResolver } from '@hookform/resolvers/zod'
import { useMutation, useQueryClient } from '@tanstack/react-query'
import { useState } from 'react'
import { z } from 'zod'
import { api, ApiError } from '@/app/_components/api-client'
import { DEFAULT_RELEASE_CONDITIONS, programInputSchema } from '@/app/_schemas/program'
import { jsonChanges } from '@/domain/json-changes'
import { LOAD_CASES } from '@/physics/load-cases'
import { SURFACE_IDS, surfaceLabel } from '@/physics/surfaces'
import { ScaledNumberInput } from './scaled-number-input'
import { DRIVE_TYRE_FIELDS, TRAILER_FIELDS, TRAILER_START, VEHICLE_FIELDS, withoutBlankTyre } from './program-fields'
import { DEFAULT_DESIGN_LATERAL_ACCEL_MPS2 } from '@/physics/lateral-margin'
import { TandemFields } from './tandem-fields'
import { DEFAULT_COMFORT } from '@/app/_lib/sets/drivability-defaults'
import { tidyProgramValues } from './form-tidy'
import { BatteryTableFields } from './battery-table-fields'
import { BatteryCornersFields } from './battery-corners-fields'
import { MapSpeedField } from './map-speed-field'
import { GradeFields } from './grade-fields'

type FormIn = z.input<typeof programInputSchema>
type FormOut = z.output<typeof programInputSchema>
type SaveAnswer = { program: { id: number; paramVersion: number }; newParamVersion?: number | null }

const REASON_NEEDED = 'Say why the parameters or release conditions change: the change makes a new parameter version.'

/**
 * The vehicle program form: name, parameters and release conditions. On an existing program a
 * change to the parameters or release conditions makes a new numbered parameter version, so the
 * form then asks for the reason (the server refuses the change without one).
 */
export function ProgramForm(props: { programId?: number; paramVersion?: number; initial?: FormIn; readOnly?: boolean }) {
  const router = useRouter()
  const qc = useQueryClient()
  const [serverError, setServerError] = useState<string | null>(null)
  // The server asked for a reason the form did not see coming: keep the field shown from then on.
  const [reasonAsked, setReasonAsked] = useState(false)
  const initial: FormIn = props.initial ?? {
    name: '',
    description: '',
    params: { axleLayout: '6x4', gearRatios: [1], trailer: null } as FormIn['params'],
    releaseConditions: DEFAULT_RELEASE_CONDITIONS,
    reason: '',
  }
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(programInputSchema),
    defaultValues: { ...initial, releaseConditions: initial.releaseConditions ?? DEFAULT_RELEASE_CONDITIONS, reason: '' },
    mode: 'onBlur',
  })
  const { register, control, handleSubmit, setValue, getValues, setError, formState } = form
  const hasTrailer = Boolean(useWatch({ control, name: 'params.trailer' }))
  const params = useWatch({ control, name: 'params' })
  const releaseConditions = useWatch({ control, name: 'releaseConditions' })
  const changed =
    props.programId !== undefined &&
    jsonChanges(tidyProgramValues({ params: initial.params, releaseConditions: initial.releaseConditions }), tidyProgramValues({ params: withoutBlankTyre(params), releaseConditions })).length > 0
  const askReason = props.programId !== undefined && (changed || reasonAsked)

  const save = useMutation({
    mutationFn: (input: FormOut) =>
      props.programId
        ? api<SaveAnswer>(`/api/programs/${props.programId}`, { method: 'PUT', json: input })
        : api<SaveAnswer>('/api/programs', { method: 'POST', json: input }),
    onSuccess: async ({ program, newParamVersion }) => {
      await qc.invalidateQueries({ queryKey: ['programs'] })
      const version = props.programId ? newParamVersion : program.paramVersion
      router.push(`/programs/${program.id}?saved=1${version ? `&version=${version}` : ''}`)
      router.refresh()
    },
    onError: (e) => {
      if (e instanceof ApiError && e.status === 400 && e.message.startsWith('reason:')) setReasonAsked(true)
      setServerError(e instanceof ApiError ? e.message : String(e))
    },
  })

  const submit = handleSubmit((v) => {
    setServerError(null)
    if (askReason && !v.reason.trim()) {
      setError('reason', { type: 'required', message: REASON_NEEDED }, { shouldFocus: true })
      return
    }
    save.mutate({ ...tidyProgramValues({ ...v, params: withoutBlankTyre(v.params) }), reason: askReason ? v.reason : '' })
  })

  return (
    <form onSubmit={submit} className="space-y-5" noValidate>
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
              <option value="6x4">6×4 (tandem, both axles driven)</option>
              <option value="6x2">6×2 (tandem, one axle driven)</option>
            </select>
          </div>
          <div className="md:col-span-2">
            <label htmlFor="description" className="label">Description</label>
            <textarea id="description" rows={2} className="field" {...register('description')} />
          </div>
        </div>
        <TandemFields control={control} register={register} />
        {VEHICLE_FIELDS.map((g) => (
          <section key={g.group} className="card">
            <h2 className="mb-3 font-semibold">{g.group}</h2>
            <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
              {g.fields.map((f) => (
                <ScaledNumberInput key={f.key} control={control} name={`params.${f.key}`} label={f.label} unit={f.unit} scale={f.scale} />
              ))}
              {g.group === 'Driveline and motor' && <GearRatiosInput control={control} />}
              {g.group === 'Driveline and motor' && <MapSpeedField register={register} />}
              {g.group === 'Battery' && <BatteryTableFields control={control} chargeW={params?.batteryChargePowerW} dischargeW={params?.batteryDischargePowerW} />}
            </div>
          </section>
        ))}
        <section className="card" aria-labelledby="drive-tyre-title">
          <h2 id="drive-tyre-title" className="font-semibold">Drive tyre</h2>
          <p className="mb-3 text-sm text-slate-600">
            The slip model: each surface sets the peak grip μ, the tyre keeps its own stiffness and shape. Leave a field blank for
            the default truck tyre; versions saved before these fields existed use it too.
          </p>
          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {DRIVE_TYRE_FIELDS.map((f) => (
              <ScaledNumberInput key={f.key} control={control} name={`params.driveTyre.${f.key}`} label={f.label} unit={f.unit} scale={f.scale} hint={f.hint} />
            ))}
          </div>
        </section>
        <section className="card">
          <label className="flex items-center gap-2 font-semibold">
            <input
              type="checkbox"
              checked={hasTrailer}
              onChange={(e) => {
                setValue('params.trailer', e.target.checked ? TRAILER_START : null, { shouldDirty: true })
                // Without a semitrailer its load cases cannot be checked; take them out of the release conditions.
                if (!e.target.checked) {
                  const cases = getValues('releaseConditions.loadCases') ?? []
                  const kept = cases.filter((c) => !LOAD_CASES.some((l) => l.id === c && l.trailer))
                  if (kept.length !== cases.length) setValue('releaseConditions.loadCases', kept, { shouldDirty: true })
                }
              }}
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
        <section className="card space-y-4" aria-labelledby="release-conditions-title">
          <div>
            <h2 id="release-conditions-title" className="font-semibold">Release conditions</h2>
            <p className="text-sm text-slate-600">
              What the release check of a map set runs both maps over: each surface with each load case, and how far below the
              traction limit every cell must stay. The check refuses conditions without a low-friction surface or without both
              the empty and laden cases.
            </p>
          </div>
          <CheckboxGroup
            control={control}
            name="releaseConditions.surfaces"
            legend="Surfaces"
            options={SURFACE_IDS.map((id) => ({ id, label: surfaceLabel(id) }))}
          />
          <CheckboxGroup
            control={control}
            name="releaseConditions.loadCases"
            legend="Load cases"
            options={LOAD_CASES.filter((c) => !c.trailer || hasTrailer || (releaseConditions?.loadCases ?? []).includes(c.id)).map((c) => ({ id: c.id, label: c.label }))}
          />
          <div className="grid max-w-2xl gap-4 sm:grid-cols-2">
            <ScaledNumberInput control={control} name="releaseConditions.marginPct" label="Traction margin (cells stay this far below the limit)" unit="%" />
            <ScaledNumberInput
              control={control}
              name="releaseConditions.designLateralAccelMps2"
              label="Design lateral acceleration"
              unit="m/s²"
              hint={`Steady lateral acceleration at the tyres of the sharpest curve taken at speed (an exit ramp). With a semitrailer, lift-off regen that leaves the drive axle less lateral grip than this is a jackknife finding. Blank: ${DEFAULT_DESIGN_LATERAL_ACCEL_MPS2} m/s².`}
            />
          </div>
          <BatteryCornersFields control={control} register={register} />
          <fieldset className="grid max-w-4xl gap-4 sm:grid-cols-4">
            <legend className="label">Comfort limits of the drivability manoeuvres (blank: {DEFAULT_COMFORT.maxPeakJerkMps3} m/s³ and {DEFAULT_COMFORT.maxTimeTo90S} s, common practice)</legend>
            <ScaledNumberInput control={control} name="releaseConditions.maxPeakJerkMps3" label="Largest peak jerk" unit="m/s³" />
            <ScaledNumberInput control={control} name="releaseConditions.maxTimeTo90S" label="Longest time to 90 % torque" unit="s" />
            <ScaledNumberInput
              control={control}
              name="releaseConditions.replayMarginNm"
              label="Replay margin over the evidence"
              unit="N·m"
              hint="When given, the release gate replays the drive logs of the program's other sets through a set: it may ask for at most this much more torque than was driven. Blank: no such check."
            />
            <div>
              <label htmlFor="comfortSource" className="label">Source of these limits</label>
              <input id="comfortSource" className="field" placeholder="e.g. the program's drivability target sheet" {...register('releaseConditions.comfortSource')} />
            </div>
          </fieldset>
          <GradeFields control={control} />
        </section>
        {askReason && (
          <section className="card border-amber-300 bg-amber-50">
            <label htmlFor="reason" className="label">Reason for this change</label>
            <p id="reason-hint" className="mb-1 text-sm text-slate-700">
              Required: saving makes parameter version {(props.paramVersion ?? 0) + 1}. Sets made before keep the version they were made with.
            </p>
            <textarea
              id="reason"
              rows={2}
              className="field"
              aria-describedby="reason-hint"
              aria-invalid={Boolean(formState.errors.reason)}
              aria-required
              {...register('reason')}
            />
            {formState.errors.reason && <p className="error-text">{formState.errors.reason.message}</p>}
          </section>
        )}
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

type FormControl = Control<FormIn, unknown, FormOut>

function CheckboxGroup(props: { control: FormControl; name: 'releaseConditions.surfaces' | 'releaseConditions.loadCases'; legend: string; options: { id: string; label: string }[] }) {
  return (
    <Controller
      control={props.control}
      name={props.name}
      render={({ field, fieldState }) => {
        const value = (field.value ?? []) as string[]
        return (
          <fieldset>
            <legend className="label">{props.legend}</legend>
            <div className="flex flex-wrap gap-x-5 gap-y-1">
              {props.options.map((o) => (
                <label key={o.id} className="flex items-center gap-2 text-sm">
                  <input
                    type="checkbox"
                    name={props.name}
                    value={o.id}
                    checked={value.includes(o.id)}
                    onBlur={field.onBlur}
                    onChange={(e) => {
                      const next = e.target.checked ? [...value, o.id] : value.filter((v) => v !== o.id)
                      // In the list's own order, so ticking a box off and on again is no change.
                      field.onChange(props.options.map((x) => x.id).filter((id) => next.includes(id)))
                    }}
                  />
                  {o.label}
                </label>
              ))}
            </div>
            {fieldState.error && <p className="error-text">{fieldState.error.message ?? fieldState.error.root?.message}</p>}
          </fieldset>
        )
      }}
    />
  )
}

function GearRatiosInput({ control }: { control: FormControl }) {
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

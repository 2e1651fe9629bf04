'use client'
import { useRouter } from 'next/navigation'
import Link from 'next/link'
import { useEffect, useState, useSyncExternalStore } from 'react'
import { useFieldArray, useForm, useWatch } from 'react-hook-form'
import { zodResolver } from '@hookform/resolvers/zod'
import { useMutation } from '@tanstack/react-query'
import type { z } from 'zod'
import { api, ApiError, newDraftId, NoAnswerError } from '@/app/_components/api-client'
import { reportInputSchema } from '@/app/_schemas/report'
import { loadCasesFor } from '@/physics/load-cases'
import { SetPicker, SetSummary, type SetChoice } from './set-picker'
import { FlagGrid } from './flag-grid'
import { FlagList } from './flag-list'
import { ConditionsFields } from './conditions-fields'
import { RatingsFields } from './ratings-fields'
import { useLocalDraft } from '@/app/_components/use-local-draft'
import { reportDraftKey, reportDraftSchema } from './report-draft'

export type ReportFormIn = z.input<typeof reportInputSchema>
type ReportFormOut = z.output<typeof reportInputSchema>

const today = () => new Date().toISOString().slice(0, 10)

/** A send that got no answer: offline (nothing went out) or unsure (it may have arrived). */
type NoAnswer = 'offline' | 'unsure' | null
/** A repeat with the same draft id is answered with the first report, so a slow send can be retried. */
const SEND_TIMEOUT_MS = 30_000

const subscribeOnline = (cb: () => void) => {
  window.addEventListener('online', cb)
  window.addEventListener('offline', cb)
  return () => {
    window.removeEventListener('online', cb)
    window.removeEventListener('offline', cb)
  }
}
const useOnline = () => useSyncExternalStore(subscribeOnline, () => navigator.onLine, () => true)

export function ReportForm(props: {
  sets: SetChoice[]
  /** Preselected set (a "drive this set" link: /reports/new?set=<id>) or program (?map=<id> of one of its maps). */
  initialSetId?: number
  initialProgramId?: number
  /** Editing an existing report: its id and current values; its set is fixed and shown read-only. */
  edit?: { reportId: number; values: ReportFormIn; set: SetChoice }
}) {
  const reportId = props.edit?.reportId
  const router = useRouter()
  // Rendered in the browser only (see report-form-loader), so the unsent draft can seed the initial state.
  const { restored: draft, save: saveDraft, clear: clearDraft } = useLocalDraft(reportDraftKey(reportId), reportDraftSchema)
  // A set named in the link wins over the draft's: the driver followed a link to drive that set.
  const initialSet = props.edit?.set ?? props.sets.find((s) => s.id === (props.initialSetId ?? draft?.values?.setId))
  const [programId, setProgramId] = useState<number | undefined>(initialSet?.programId ?? draft?.programId ?? props.initialProgramId)
  const [restored, setRestored] = useState<string | null>(draft?.savedAt ?? null)
  const [serverError, setServerError] = useState<{ text: string; reportId?: number } | null>(null)
  const [noAnswer, setNoAnswer] = useState<NoAnswer>(null)
  // The draft's id, kept with the draft across reloads: the Idempotency-Key of the POST.
  const [draftId, setDraftId] = useState(() => draft?.id ?? newDraftId())
  const online = useOnline()
  const form = useForm<ReportFormIn, unknown, ReportFormOut>({
    resolver: zodResolver(reportInputSchema),
    defaultValues: {
      ...(props.edit?.values ?? { drivenOn: today(), trailer: false, flags: [], comments: '', payloadKg: 0, loadCase: 'empty', surface: 'dry-asphalt' }),
      ...draft?.values,
      ...(initialSet ? { setId: initialSet.id } : {}),
    },
  })
  const { control, handleSubmit, setValue, reset, formState } = form
  const flags = useFieldArray({ control, name: 'flags' })
  const values = useWatch({ control })
  const set = props.edit?.set ?? props.sets.find((s) => s.id === values.setId)
  // Which of the set's maps the tap grid shows; new flags go on that map.
  const [gridChoice, setGridChoice] = useState<'drive' | 'regen'>('drive')
  const gridMap = set && !set[gridChoice] ? (gridChoice === 'drive' ? 'regen' : 'drive') : gridChoice
  const gridPart = set?.[gridMap] ?? null

  // Keep saving the form in the browser as the driver types.
  useEffect(() => {
    if (formState.isDirty || programId) saveDraft({ id: draftId, values, programId, savedAt: new Date().toISOString() })
  }, [values, programId, formState.isDirty, saveDraft, draftId])

  const submit = useMutation({
    // Not the default 'online' mode, which pauses a send while offline and leaves the button on
    // "Sending…" with no word of why: send now, and say plainly that nothing went out.
    networkMode: 'always',
    mutationFn: (body: ReportFormOut) => {
      setServerError(null)
      setNoAnswer(null)
      // Kept before sending, so a reload after a lost answer sends the same draft id again.
      saveDraft({ id: draftId, values, programId, savedAt: new Date().toISOString() })
      return reportId
        ? api<{ report: { id: number } }>(`/api/reports/${reportId}`, { method: 'PUT', json: body, timeoutMs: SEND_TIMEOUT_MS })
        : api<{ report: { id: number } }>('/api/reports', { method: 'POST', json: body, headers: { 'idempotency-key': draftId }, timeoutMs: SEND_TIMEOUT_MS })
    },
    onSuccess: ({ report }) => {
      clearDraft()
      router.push(`/reports/${report.id}?filed=1`)
    },
    onError: (e) => {
      if (e instanceof NoAnswerError) return setNoAnswer(e.offline ? 'offline' : 'unsure')
      const first = e instanceof ApiError && e.code === 'idempotency_key_reused' ? (e.details as { resultId?: number } | undefined)?.resultId : undefined
      setServerError({ text: e.message, reportId: first ?? undefined })
    },
  })

  return (
    <form onSubmit={handleSubmit((v) => submit.mutate(v))} className="space-y-4" noValidate>
      {restored && (
        <p role="status" className="rounded bg-accent-soft px-3 py-2 text-sm">
          Restored your unsent report from {restored.slice(0, 16).replace('T', ' ')} UTC.{' '}
          <button type="button" className="underline" onClick={() => { clearDraft(); setRestored(null); setDraftId(newDraftId()); reset() }}>Start over</button>
        </p>
      )}
      <section className="card space-y-3">
        <h2 className="font-semibold">What you drove</h2>
        {props.edit ? (
          <SetSummary set={props.edit.set} fixed />
        ) : (
          <SetPicker
            sets={props.sets}
            programId={programId}
            setId={values.setId}
            onProgram={(id) => {
              setProgramId(id)
              // Empty until a set of this program is chosen: NaN, as an emptied number input holds (the schema refuses it).
              if (set?.programId !== id) setValue('setId', NaN, { shouldDirty: true })
            }}
            onSet={(id) => setValue('setId', id, { shouldDirty: true, shouldValidate: true })}
            error={formState.errors.setId?.message}
          />
        )}
      </section>
      <ConditionsFields form={form} loadCases={set?.loadCases ?? loadCasesFor({ trailer: null })} />
      <RatingsFields form={form} />
      <section className="card space-y-3">
        <h2 className="font-semibold">Points on the map</h2>
        {set && gridPart ? (
          <>
            {set.drive && set.regen && (
              <div role="radiogroup" aria-label="Map to flag on" className="flex flex-wrap gap-2 text-sm">
                {(['drive', 'regen'] as const).map((k) => (
                  <label key={k} className={`btn ${gridMap === k ? 'bg-accent-soft font-semibold' : ''}`}>
                    <input type="radio" className="sr-only" name="grid-map" checked={gridMap === k} onChange={() => setGridChoice(k)} />
                    {k === 'drive' ? 'Drive map' : 'Regen map'} ({set[k]!.mapName} r{set[k]!.number})
                  </label>
                ))}
              </div>
            )}
            <FlagGrid
              key={gridMap}
              kind={gridMap}
              mapId={gridPart.mapId}
              revisionNumber={gridPart.number}
              flagged={(values.flags ?? []).filter((f) => f?.map === gridMap).map((f) => ({ pedalPct: f?.pedalPct ?? -1, speedKmh: f?.speedKmh ?? -1 }))}
              onPick={(p, s) => flags.append({ map: gridMap, pedalPct: p, speedKmh: s, what: '', severity: 2 })}
            />
          </>
        ) : (
          <p className="text-sm text-slate-500">Choose the set to flag points on its maps.</p>
        )}
        <FlagList form={form} fields={flags.fields} maps={set ? (['drive', 'regen'] as const).filter((k) => set[k]) : ['drive', 'regen']} onRemove={flags.remove} onAdd={() => flags.append({ map: gridMap, pedalPct: 0, speedKmh: 0, what: '', severity: 2 })} />
      </section>
      {!online && !noAnswer && (
        <p role="status" className="rounded bg-accent-soft px-3 py-2 text-sm">You are offline. Keep writing: the report is kept on this device until you send it.</p>
      )}
      {noAnswer && (
        <p role="alert" data-testid="send-state" className="error-text text-sm">
          {noAnswer === 'offline'
            ? 'You are offline, so the report was not sent. It is kept on this device: press the button again when you have signal.'
            : 'The connection dropped before the server answered, so it is not known whether the report arrived. It is kept on this device: press the button again. If the first send did arrive you are taken to that report; nothing is filed twice.'}
        </p>
      )}
      {serverError && (
        <p role="alert" className="error-text text-sm">
          {serverError.text}{' '}
          {serverError.reportId && <Link className="underline" href={`/reports/${serverError.reportId}`}>Open report {serverError.reportId}</Link>}
        </p>
      )}
      {Object.keys(formState.errors).length > 0 && <p role="alert" className="error-text text-sm">Some fields need attention; see the messages above.</p>}
      <button type="submit" className="btn-primary w-full justify-center sm:w-auto" disabled={submit.isPending}>
        {submit.isPending ? 'Sending…' : reportId ? 'Save changes' : 'File report'}
      </button>
    </form>
  )
}

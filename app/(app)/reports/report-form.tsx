'use client'
import { useRouter } from 'next/navigation'
import { useEffect, useState } from 'react'
import { useFieldArray, useForm, useWatch } from 'react-hook-form'
import { zodResolver } from '@hookform/resolvers/zod'
import { useMutation } from '@tanstack/react-query'
import type { z } from 'zod'
import { api } from '@/app/_components/api-client'
import { reportInputSchema } from '@/app/_schemas/report'
import { loadCasesFor } from '@/physics/load-cases'
import { RevisionPicker, type MapOption } from './revision-picker'
import { FlagGrid } from './flag-grid'
import { FlagList } from './flag-list'
import { ConditionsFields } from './conditions-fields'
import { RatingsFields } from './ratings-fields'
import { useLocalDraft } from '@/app/_components/use-local-draft'
import { reportDraftKey, reportDraftSchema } from './report-draft'

export type ReportFormIn = z.input<typeof reportInputSchema>
type ReportFormOut = z.output<typeof reportInputSchema>

const today = () => new Date().toISOString().slice(0, 10)

export function ReportForm(props: {
  maps: MapOption[]
  loadCases: Record<number, string[]>
  initialMapId?: number
  /** Editing an existing report: its id and current values. */
  edit?: { reportId: number; values: ReportFormIn; revisionNumber: number }
}) {
  const reportId = props.edit?.reportId
  const router = useRouter()
  // Rendered in the browser only (see report-form-loader), so the unsent draft can seed the initial state.
  const { restored: draft, save: saveDraft, clear: clearDraft } = useLocalDraft(reportDraftKey(reportId), reportDraftSchema)
  const [mapId, setMapId] = useState<number | undefined>(draft?.mapId ?? props.initialMapId)
  const [revisionNumber, setRevisionNumber] = useState<number | undefined>(draft?.revisionNumber ?? props.edit?.revisionNumber)
  const [restored, setRestored] = useState<string | null>(draft?.savedAt ?? null)
  const [serverError, setServerError] = useState<string | null>(null)
  const form = useForm<ReportFormIn, unknown, ReportFormOut>({
    resolver: zodResolver(reportInputSchema),
    defaultValues: {
      ...(props.edit?.values ?? { drivenOn: today(), trailer: false, flags: [], comments: '', payloadKg: 0, loadCase: 'empty', surface: 'dry-asphalt' }),
      ...draft?.values,
    },
  })
  const { control, handleSubmit, setValue, resetField, reset, formState } = form
  const flags = useFieldArray({ control, name: 'flags' })
  const values = useWatch({ control })
  const revisionId = values.revisionId
  const map = props.maps.find((m) => m.id === mapId)

  // Keep saving the form in the browser as the driver types.
  useEffect(() => {
    if (formState.isDirty || mapId) saveDraft({ values, mapId, revisionNumber, savedAt: new Date().toISOString() })
  }, [values, mapId, revisionNumber, formState.isDirty, saveDraft])

  const submit = useMutation({
    mutationFn: (body: ReportFormOut) =>
      reportId
        ? api<{ report: { id: number } }>(`/api/reports/${reportId}`, { method: 'PUT', json: body })
        : api<{ report: { id: number } }>('/api/reports', { method: 'POST', json: body }),
    onSuccess: ({ report }) => {
      clearDraft()
      router.push(`/reports/${report.id}?filed=1`)
    },
    onError: (e) => setServerError(e.message),
  })

  return (
    <form onSubmit={handleSubmit((v) => submit.mutate(v))} className="space-y-4" noValidate>
      {restored && (
        <p role="status" className="rounded bg-accent-soft px-3 py-2 text-sm">
          Restored your unsent report from {restored.slice(0, 16).replace('T', ' ')} UTC.{' '}
          <button type="button" className="underline" onClick={() => { clearDraft(); setRestored(null); reset() }}>Start over</button>
        </p>
      )}
      <section className="card space-y-3">
        <h2 className="font-semibold">What you drove</h2>
        <RevisionPicker
          maps={props.maps}
          mapId={mapId}
          revisionId={revisionId}
          onMap={(id) => {
            setMapId(id)
            setRevisionNumber(undefined)
            resetField('revisionId')
          }}
          onRevision={(id, n) => {
            setRevisionNumber(n)
            setValue('revisionId', id, { shouldDirty: true, shouldValidate: true })
          }}
          error={formState.errors.revisionId?.message}
        />
      </section>
      <ConditionsFields form={form} loadCases={(map && props.loadCases[map.programId]) || loadCasesFor({ trailer: null })} />
      <RatingsFields form={form} />
      <section className="card space-y-3">
        <h2 className="font-semibold">Points on the map</h2>
        {mapId && revisionNumber ? (
          <FlagGrid mapId={mapId} revisionNumber={revisionNumber} flagged={values.flags?.map((f) => ({ pedalPct: f?.pedalPct ?? -1, speedKmh: f?.speedKmh ?? -1 })) ?? []} onPick={(p, s) => flags.append({ pedalPct: p, speedKmh: s, what: '', severity: 2 })} />
        ) : (
          <p className="text-sm text-slate-500">Choose the revision to flag points on its map.</p>
        )}
        <FlagList form={form} fields={flags.fields} onRemove={flags.remove} onAdd={() => flags.append({ pedalPct: 0, speedKmh: 0, what: '', severity: 2 })} />
      </section>
      {serverError && <p role="alert" className="error-text text-sm">{serverError}</p>}
      {Object.keys(formState.errors).length > 0 && <p role="alert" className="error-text text-sm">Some fields need attention; see the messages above.</p>}
      <button type="submit" className="btn-primary w-full justify-center sm:w-auto" disabled={submit.isPending}>
        {submit.isPending ? 'Sending…' : reportId ? 'Save changes' : 'File report'}
      </button>
    </form>
  )
}

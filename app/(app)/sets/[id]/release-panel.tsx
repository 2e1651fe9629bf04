'use client'
import { useRouter } from 'next/navigation'
import { useState, type FormEvent } from 'react'
import { useMutation } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import { ConfirmStep } from '@/app/_components/confirm-step'

export interface ExceptionChoice {
  key: string
  /** "Drive map, Packed snow, Laden: 4 cell(s) above the limit" */
  label: string
}

/**
 * The lead's release of a set: a reason for each traction exception (map × surface × load case) and for
 * each release condition no drive report covers (its waiver), then Release. The server judges the gate
 * again and its refusal is shown as it says it.
 */
export function ReleasePanel({ setId, setNumber, exceptions, uncovered = [], unmet, summary }: { setId: number; setNumber: number; exceptions: ExceptionChoice[]; uncovered?: ExceptionChoice[]; unmet: string[]; summary: string }) {
  const router = useRouter()
  const [confirming, setConfirming] = useState(false)
  const [reasons, setReasons] = useState<Record<string, string>>({})
  const [error, setError] = useState<string | null>(null)
  const [done, setDone] = useState<string | null>(null)
  const release = useMutation({
    mutationFn: () =>
      api<{ sha256: string; filename: string }>(`/api/sets/${setId}/release`, {
        method: 'POST',
        json: { acknowledgements: [...exceptions, ...uncovered].map((e) => ({ key: e.key, reason: (reasons[e.key] ?? '').trim() })) },
      }),
    onSuccess: (r) => {
      setError(null)
      setConfirming(false)
      setDone(`Set ${setNumber} is released. Package ${r.filename}, SHA-256 ${r.sha256}.`)
      router.refresh()
    },
    onError: (e) => {
      setError(e.message)
      setConfirming(false)
      router.refresh()
    },
  })

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault()
    const missing = exceptions.filter((x) => !(reasons[x.key] ?? '').trim())
    if (missing.length) return setError(`Give a reason for each traction exception (${missing.length} without one)`)
    const unwaived = uncovered.filter((x) => !(reasons[x.key] ?? '').trim())
    if (unwaived.length) return setError(`Give a reason for each release condition without a drive report (${unwaived.length} without one)`)
    setError(null)
    setConfirming(true)
  }

  return (
    <form onSubmit={onSubmit} className="card space-y-3" aria-labelledby="release-heading" data-testid="release-panel">
      <h3 id="release-heading" className="font-semibold">Release Set {setNumber} to the program&apos;s trucks</h3>
      {unmet.length > 0 && (
        <div className="rounded border border-line bg-slate-50 p-2 text-sm">
          <p className="font-semibold">Not yet releasable; the server will refuse until these are met:</p>
          <ul className="ml-5 list-disc">
            {unmet.map((u, i) => <li key={i}>{u}</li>)}
          </ul>
        </div>
      )}
      {exceptions.length > 0 && (
        <fieldset className="space-y-2 rounded border border-amber-300 bg-amber-50 p-2">
          <legend className="px-1 text-sm font-semibold">Cells above the traction limit: to release anyway, give a reason for each</legend>
          {exceptions.map((x) => (
            <div key={x.key}>
              <label htmlFor={`ack-${x.key}`} className="text-sm">{x.label}</label>
              <input
                id={`ack-${x.key}`}
                className="field"
                required
                maxLength={2000}
                value={reasons[x.key] ?? ''}
                onChange={(ev) => setReasons({ ...reasons, [x.key]: ev.target.value })}
                data-testid={`ack-${x.key}`}
              />
            </div>
          ))}
        </fieldset>
      )}
      {uncovered.length > 0 && (
        <fieldset className="space-y-2 rounded border border-amber-300 bg-amber-50 p-2" data-testid="coverage-waivers">
          <legend className="px-1 text-sm font-semibold">Release conditions no drive report covers: to release anyway, waive each with a reason</legend>
          {uncovered.map((x) => (
            <div key={x.key}>
              <label htmlFor={`waive-${x.key}`} className="text-sm">{x.label}</label>
              <input
                id={`waive-${x.key}`}
                className="field"
                required
                maxLength={2000}
                value={reasons[x.key] ?? ''}
                onChange={(ev) => setReasons({ ...reasons, [x.key]: ev.target.value })}
                data-testid={`waive-${x.key}`}
              />
            </div>
          ))}
        </fieldset>
      )}
      {error && <p role="alert" className="error-text text-sm">{error}</p>}
      {done && <p role="status" className="rounded bg-accent-soft px-2 py-1 text-sm break-words">{done}</p>}
      {confirming ? (
        <ConfirmStep
          summary={summary}
          confirmLabel={`Yes, release Set ${setNumber}`}
          pending={release.isPending}
          onConfirm={() => release.mutate()}
          onCancel={() => {
            setConfirming(false)
            setTimeout(() => document.getElementById(`release-${setId}`)?.focus(), 0)
          }}
        />
      ) : (
        <button id={`release-${setId}`} type="submit" className="btn-primary" disabled={release.isPending}>
          {`Release Set ${setNumber}`}
        </button>
      )}
    </form>
  )
}

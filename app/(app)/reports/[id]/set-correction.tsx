'use client'
import { useRouter } from 'next/navigation'
import { useState } from 'react'
import { useMutation } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import { setLabel, type SetChoice } from '../set-picker'

/**
 * A lead engineer moves a report to the set the truck really ran (another set of the same
 * program), saying why; the change is recorded in the audit trail and the logs are analysed again.
 */
export function SetCorrection(props: { reportId: number; choices: SetChoice[] }) {
  const router = useRouter()
  const [setId, setSetId] = useState<number | ''>('')
  const [reason, setReason] = useState('')
  const correct = useMutation({
    mutationFn: () => api(`/api/reports/${props.reportId}/set`, { method: 'POST', json: { setId, reason } }),
    onSuccess: () => {
      setSetId('')
      setReason('')
      router.refresh()
    },
  })
  return (
    <details className="card text-sm">
      <summary className="cursor-pointer font-semibold">Correct the set</summary>
      <div className="mt-2 space-y-2">
        <p className="text-slate-600">If the truck ran another set than the driver chose, move the report to it. The reason is kept in the audit trail, and the logs are analysed again against the new set.</p>
        {props.choices.length === 0 ? (
          <p className="text-slate-600">This program has no other set.</p>
        ) : (
          <>
            <div>
              <label htmlFor="correct-set" className="label">The set the truck ran</label>
              <select id="correct-set" className="field" value={setId} onChange={(e) => setSetId(e.target.value ? Number(e.target.value) : '')}>
                <option value="">Choose…</option>
                {props.choices.map((c) => (
                  <option key={c.id} value={c.id}>{setLabel(c)}</option>
                ))}
              </select>
            </div>
            <div>
              <label htmlFor="correct-reason" className="label">Why (e.g. what the vehicle reported)</label>
              <textarea id="correct-reason" className="field" rows={2} value={reason} onChange={(e) => setReason(e.target.value)} />
            </div>
            {correct.error && <p role="alert" className="error-text">{correct.error.message}</p>}
            <button type="button" className="btn" disabled={!setId || !reason.trim() || correct.isPending} onClick={() => correct.mutate()}>
              Move the report to this set
            </button>
          </>
        )}
      </div>
    </details>
  )
}

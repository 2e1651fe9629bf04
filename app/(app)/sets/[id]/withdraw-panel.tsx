'use client'
import { useRouter } from 'next/navigation'
import { useState, type FormEvent } from 'react'
import { useMutation } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import { ConfirmStep } from '@/app/_components/confirm-step'

/** A lead withdraws the set's current release, with the reason; the release it replaced comes back. */
export function WithdrawPanel({ setId, setNumber, summary }: { setId: number; setNumber: number; summary: string }) {
  const router = useRouter()
  const [confirming, setConfirming] = useState(false)
  const [reason, setReason] = useState('')
  const [error, setError] = useState<string | null>(null)
  const withdraw = useMutation({
    mutationFn: () => api<{ restoredSetId: number | null }>(`/api/sets/${setId}/withdraw`, { method: 'POST', json: { reason: reason.trim() } }),
    onSuccess: () => {
      setError(null)
      setConfirming(false)
      router.refresh()
    },
    onError: (e) => {
      setError(e.message)
      setConfirming(false)
    },
  })

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault()
    if (!reason.trim()) return setError('Say why the release is withdrawn')
    setError(null)
    setConfirming(true)
  }

  return (
    <form onSubmit={onSubmit} className="card space-y-3 border-danger/40" aria-labelledby="withdraw-heading" data-testid="withdraw-panel">
      <h3 id="withdraw-heading" className="font-semibold">Withdraw the release of Set {setNumber}</h3>
      <p className="text-sm text-slate-600">
        Everyone who opens this set or its package is told it was withdrawn, with your reason. The release it replaced, if any, becomes the released set again.
      </p>
      <div>
        <label htmlFor="withdraw-reason" className="label">Reason (required)</label>
        <textarea id="withdraw-reason" rows={3} required maxLength={5000} className="field" value={reason} onChange={(e) => setReason(e.target.value)} />
      </div>
      {error && <p role="alert" className="error-text text-sm">{error}</p>}
      {confirming ? (
        <ConfirmStep
          danger
          summary={summary}
          confirmLabel={`Yes, withdraw Set ${setNumber}`}
          pending={withdraw.isPending}
          onConfirm={() => withdraw.mutate()}
          onCancel={() => {
            setConfirming(false)
            setTimeout(() => document.getElementById(`withdraw-${setId}`)?.focus(), 0)
          }}
        />
      ) : (
        <button id={`withdraw-${setId}`} type="submit" className="btn border-danger text-danger" disabled={withdraw.isPending}>
          Withdraw the release
        </button>
      )}
    </form>
  )
}

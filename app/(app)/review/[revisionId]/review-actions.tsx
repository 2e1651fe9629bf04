'use client'
import { useRouter } from 'next/navigation'
import { useRef, useState } from 'react'
import { useMutation } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import { ConfirmStep } from '@/app/_components/confirm-step'
import { ACTION_LABELS, type ReviewAction } from '@/domain/review-actions'

/** Actions that ask "are you sure" with a one-line summary first. */
const CONFIRMED: readonly ReviewAction[] = ['approve']

/**
 * Submit, approve or send back, as open to this person now; the server checks them again. A release
 * is done on a map set. An action the role could take but not on this revision (approving one's own)
 * is shown with the reason instead of vanishing.
 */
export function ReviewActions(props: {
  revisionId: number
  actions: ReviewAction[]
  /** One line per confirmed action: what will happen. */
  summaries: Partial<Record<ReviewAction, string>>
  blocked: { action: ReviewAction; reason: string }[]
}) {
  const router = useRouter()
  const [comment, setComment] = useState('')
  const [error, setError] = useState<string | null>(null)
  const [confirming, setConfirming] = useState<ReviewAction | null>(null)
  const openers = useRef<Partial<Record<ReviewAction, HTMLButtonElement | null>>>({})
  const run = useMutation({
    mutationFn: (action: ReviewAction) =>
      api(`/api/revisions/${props.revisionId}/actions`, {
        method: 'POST',
        json: { action, comment },
      }),
    onSuccess: () => {
      setError(null)
      setComment('')
      setConfirming(null)
      router.refresh()
    },
    onError: (e) => setError(e.message),
  })
  return (
    <section className="card space-y-3" aria-label="Review actions">
      <h2 className="font-semibold">Your decision</h2>
      <div>
        <label htmlFor="review-comment" className="label">Comment (required to send back)</label>
        <textarea id="review-comment" rows={3} className="field" value={comment} onChange={(e) => setComment(e.target.value)} />
      </div>
      {error && <p role="alert" className="error-text text-sm">{error}</p>}
      <div className="flex flex-wrap gap-2">
        {props.actions.map((a) => (
          <button
            key={a}
            ref={(el) => {
              openers.current[a] = el
            }}
            type="button"
            className={a === 'send_back' ? 'btn' : 'btn-primary'}
            disabled={run.isPending || confirming !== null}
            aria-expanded={CONFIRMED.includes(a) ? confirming === a : undefined}
            onClick={() => (CONFIRMED.includes(a) ? setConfirming(a) : run.mutate(a))}
          >
            {ACTION_LABELS[a]}
          </button>
        ))}
      </div>
      {confirming && (
        <ConfirmStep
          summary={props.summaries[confirming] ?? `${ACTION_LABELS[confirming]} this revision?`}
          confirmLabel={`Yes, ${ACTION_LABELS[confirming].toLowerCase()}`}
          pending={run.isPending}
          onConfirm={() => run.mutate(confirming)}
          onCancel={() => {
            const opener = openers.current[confirming]
            setConfirming(null)
            // Back to the button that opened it, once it is enabled again.
            setTimeout(() => opener?.focus(), 0)
          }}
        />
      )}
      {props.blocked.map((b) => (
        <p key={b.action} className="text-sm text-slate-700" data-testid={`blocked-${b.action}`}>
          <span className="font-semibold">{ACTION_LABELS[b.action]}</span> is not open to you here: {b.reason}.
        </p>
      ))}
    </section>
  )
}

'use client'
/**
 * The "saved" message after a save from the editor, with the next step beside it: submit the new
 * revision for review without a detour through the review page. The server checks the role,
 * the author and the state again.
 */
import { useSubmitForReview } from '@/app/_components/use-submit-for-review'
import { ACTION_LABELS } from '@/domain/review-actions'

export function SubmitAfterSave(props: { number: number; revisionId: number | null; canSubmit: boolean }) {
  const submit = useSubmitForReview()
  return (
    <div role="status" className="flex flex-wrap items-center gap-3 rounded bg-accent-soft px-3 py-2 text-sm">
      <span>Saved revision {props.number}.{submit.isSuccess && ' Submitted for review: the lead engineers have been told.'}</span>
      {props.canSubmit && props.revisionId !== null && !submit.isSuccess && (
        <button type="button" className="btn px-2 py-0.5 text-xs" disabled={submit.isPending} onClick={() => props.revisionId !== null && submit.mutate(props.revisionId)}>
          {submit.isPending ? 'Submitting…' : `${ACTION_LABELS.submit}: r${props.number}`}
        </button>
      )}
      {submit.isError && <span className="error-text">{submit.error.message}</span>}
    </div>
  )
}

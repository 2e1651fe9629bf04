'use client'
import Link from 'next/link'
import { useEffect, useRef, useState } from 'react'
import { useSubmitForReview } from '@/app/_components/use-submit-for-review'
import { ACTION_LABELS } from '@/domain/review-actions'

export interface DraftRow {
  id: number
  label: string
  message: string
  savedAt: string
}

/**
 * The signed-in engineer's own drafts (maps whose latest revision is their draft), each with
 * "Submit for review". A submitted row leaves the list when the page is read again, so the result
 * is said in a status line above it, which takes the focus the vanished button had.
 */
export function YourDrafts({ drafts }: { drafts: DraftRow[] }) {
  const [done, setDone] = useState<string | null>(null)
  const status = useRef<HTMLParagraphElement>(null)
  const submit = useSubmitForReview((id) => setDone(`Submitted ${drafts.find((d) => d.id === id)?.label ?? 'the revision'} for review: the lead engineers have been told.`))
  // Once the line has its text (an empty one is hidden and cannot take focus).
  useEffect(() => {
    if (done) status.current?.focus()
  }, [done])
  return (
    <section className="card" aria-labelledby="your-drafts" data-testid="your-drafts">
      <h2 id="your-drafts" className="mb-2 font-semibold">Your drafts</h2>
      <p ref={status} role="status" tabIndex={-1} className="text-sm empty:hidden">{done}</p>
      {drafts.length === 0 ? (
        <p className="text-sm text-slate-500">No map has a draft of yours as its latest revision.</p>
      ) : (
        <ul className="divide-y divide-line text-sm">
          {drafts.map((d) => (
            <li key={d.id} className="flex flex-wrap items-center gap-x-3 gap-y-1 py-2" data-testid={`draft-${d.id}`}>
              <Link href={`/review/${d.id}`} className="font-medium text-accent hover:underline">{d.label}</Link>
              <span className="min-w-0 break-words text-slate-600">“{d.message}”, saved {d.savedAt}</span>
              <button
                type="button"
                className="btn ml-auto px-2 py-0.5 text-xs"
                aria-label={`${ACTION_LABELS.submit}: ${d.label}`}
                disabled={submit.isPending}
                onClick={() => submit.mutate(d.id)}
              >
                {submit.isPending && submit.variables === d.id ? 'Submitting…' : ACTION_LABELS.submit}
              </button>
              {submit.isError && submit.variables === d.id && <p role="alert" className="error-text basis-full">{submit.error.message}</p>}
            </li>
          ))}
        </ul>
      )}
    </section>
  )
}

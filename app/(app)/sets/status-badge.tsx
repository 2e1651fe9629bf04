import { SET_STATUS_LABELS, type SetStatus } from '@/db/queries/sets'

const TONE: Readonly<Record<SetStatus, string>> = {
  testing: 'bg-slate-100 text-ink',
  released: 'bg-accent-soft text-accent',
  retired: 'bg-slate-200 text-slate-700',
  withdrawn: 'bg-danger text-white',
}

/** Where a set stands, in words; the colour only repeats them. */
export function SetStatusBadge({ status, className = '' }: { status: SetStatus; className?: string }) {
  return (
    <span data-testid="set-status" data-status={status} className={`inline-block rounded px-2 py-0.5 text-xs font-semibold whitespace-nowrap ${TONE[status]} ${className}`}>
      {SET_STATUS_LABELS[status]}
    </span>
  )
}

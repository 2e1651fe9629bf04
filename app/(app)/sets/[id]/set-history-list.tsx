import { formatTime } from '@/app/_components/format'
import type { HistoryEvent } from './history'

/** Made, releases, replacements and withdrawals, oldest first, with who. */
export function SetHistoryList({ events }: { events: HistoryEvent[] }) {
  return (
    <section className="card" aria-labelledby="history-heading">
      <h2 id="history-heading" className="mb-2 text-lg font-semibold">History of this set</h2>
      <ol className="space-y-1 text-sm" data-testid="set-history">
        {events.map((e, i) => (
          <li key={i} data-kind={e.kind} className="break-words">
            <span className="whitespace-nowrap text-slate-600">{formatTime(e.at)}</span> — {e.text}
            {e.by && <> by {e.by}</>}
            {e.reason && <> — “{e.reason}”</>}
          </li>
        ))}
      </ol>
    </section>
  )
}

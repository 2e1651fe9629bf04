import Link from 'next/link'
import { formatTime } from '@/app/_components/format'
import type { setsAwaitingDrive } from '@/db/queries/tasks'

type WaitingSet = Awaited<ReturnType<typeof setsAwaitingDrive>>[number]

/** The overview's box for test drivers: sets under test (never released), each with its reports so far and its way to a report. */
export function SetsToDrive({ sets }: { sets: WaitingSet[] }) {
  return (
    <section className="card" data-testid="waiting-drive" aria-labelledby="waiting-drive-heading">
      <h2 id="waiting-drive-heading" className="mb-2 font-semibold">
        Sets under test <span className="ml-1 rounded bg-slate-100 px-1.5 text-xs">{sets.length}</span>
      </h2>
      {sets.length === 0 ? (
        <p className="text-sm text-slate-500">No set is under test.</p>
      ) : (
        <ul className="space-y-2 text-sm">
          {sets.slice(0, 12).map((s) => (
            <li key={s.id} className="break-words">
              <Link href={`/sets/${s.id}`} className="text-accent hover:underline">
                {s.programName} · Set {s.number}
              </Link>
              <span className="text-slate-600"> — made {formatTime(s.createdAt)}, {s.reports === 0 ? 'not driven yet' : `${s.reports} report${s.reports === 1 ? '' : 's'}`}</span>
              {s.note && <span className="line-clamp-2 block text-xs text-slate-600">{s.note}</span>}
              <Link href={`/reports/new?set=${s.id}`} className="block text-xs font-semibold text-accent hover:underline" aria-label={`Drive this set: ${s.programName} · Set ${s.number}`}>
                Drive this set
              </Link>
            </li>
          ))}
        </ul>
      )}
    </section>
  )
}

import Link from 'next/link'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { formatTime } from '@/app/_components/format'
import { availableActions } from '@/app/_lib/review/states'
import { latestDraftsBy, revisionsInState } from '@/db/queries/review'
import { YourDrafts } from './your-drafts'

export const metadata = { title: 'Review queue' }

export default async function ReviewQueuePage() {
  const user = await requirePageUser(['lead_engineer', 'calibration_engineer'])
  const [waiting, approved, drafts] = await Promise.all([revisionsInState('in_review'), revisionsInState('approved'), latestDraftsBy(user.id)])
  // The same rule the review API applies: only what this person may submit now gets the button.
  const mine = drafts.filter((d) => availableActions('draft', user, d.authorId).includes('submit'))
  const section = (title: string, rows: typeof waiting, empty: string) => (
    <section className="card">
      <h2 className="mb-2 font-semibold">{title}</h2>
      {rows.length === 0 ? (
        <p className="text-sm text-slate-500">{empty}</p>
      ) : (
        <ul className="divide-y divide-line text-sm">
          {rows.map((r) => (
            <li key={r.id} className="flex flex-wrap gap-2 py-2" data-testid={`queue-${r.id}`}>
              <Link href={`/review/${r.id}`} className="font-medium text-accent hover:underline">
                {r.programName} · {r.mapName} r{r.number}
              </Link>
              <span className="text-slate-600">“{r.message}” — {r.authorName}, {formatTime(r.createdAt)}</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  )
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Review queue</h1>
      <YourDrafts drafts={mine.map((d) => ({ id: d.id, label: `${d.programName} · ${d.mapName} r${d.number}`, message: d.message, savedAt: formatTime(d.createdAt) }))} />
      {section('Waiting for review', waiting, 'Nothing is waiting for review.')}
      {section('Approved, not yet released', approved, 'No approved revision is waiting to be released.')}
      <p className="text-sm text-slate-600">
        An approved revision reaches the trucks in a map set — a drive revision, a regen revision and a parameter version of
        the program — which is checked and released as a whole. A revision’s review page lists the sets holding it.
      </p>
    </div>
  )
}

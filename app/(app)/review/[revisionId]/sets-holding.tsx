import Link from 'next/link'
import { formatTime } from '@/app/_components/format'
import { SET_STATUS_LABELS, type SetSummary } from '@/db/queries/sets'

/**
 * The map sets that hold this revision: a revision reaches the trucks only in a set (a drive
 * revision, a regen revision and a parameter version), and a set is released or withdrawn as a whole.
 */
export function SetsHolding(props: { revisionId: number; kind: 'drive' | 'regen'; sets: SetSummary[]; canMake: boolean }) {
  const other = props.kind === 'drive' ? 'regen' : 'drive'
  return (
    <section className="card space-y-2" aria-labelledby="sets-title" data-testid="sets-holding">
      <div className="flex flex-wrap items-center gap-2">
        <h2 id="sets-title" className="font-semibold">Map sets holding this revision</h2>
        {props.canMake && (
          <Link href={`/sets/new?${props.kind}=${props.revisionId}`} className="btn sm:ml-auto" data-testid="make-set-link">
            Make a set with this revision
          </Link>
        )}
      </div>
      <p className="text-sm text-slate-600">
        A revision goes to the trucks in a map set, with a {other} map revision and a parameter version of the program; the
        release check, the release and a withdrawal are done on the set.
      </p>
      {props.sets.length === 0 ? (
        <p className="text-sm text-slate-500">No set holds this revision yet.</p>
      ) : (
        <ul className="divide-y divide-line text-sm">
          {props.sets.map((s) => {
            const otherName = other === 'drive' ? s.driveMapName : s.regenMapName
            const otherNumber = other === 'drive' ? s.driveNumber : s.regenNumber
            return (
              <li key={s.id} className="flex flex-wrap items-baseline gap-x-3 gap-y-0.5 py-2" data-testid={`set-${s.id}`}>
                <Link href={`/sets/${s.id}`} className="font-semibold text-accent hover:underline">Set {s.number}</Link>
                <span>
                  {other === 'drive' ? 'Drive' : 'Regen'}: {otherName ? `${otherName} r${otherNumber}` : 'none'}
                </span>
                <span>Parameter version {s.paramVersion}</span>
                <span className={s.status === 'released' ? 'rounded bg-accent-soft px-1.5 font-semibold text-accent' : s.status === 'withdrawn' ? 'text-danger' : 'text-slate-600'}>
                  {SET_STATUS_LABELS[s.status]}
                </span>
                <span className="text-xs text-slate-500">made {formatTime(s.createdAt)}</span>
              </li>
            )
          })}
        </ul>
      )}
    </section>
  )
}

import Link from 'next/link'
import type { MapDiff } from '@/maps'
import type { PartChange, ReleaseComparison } from '@/app/_lib/sets/release-before'

/** For the revision in the trucks now: this map's line against the release before, in words. */
function AgainstBefore({ before, part }: { before: ReleaseComparison['before']; part: PartChange }) {
  const setLink = (
    <>
      <Link href={`/sets/${before.setId}`} className="text-accent underline">set {before.setNumber}</Link>
      {before.withdrawnAt ? ', since withdrawn' : ''}
    </>
  )
  if (part.change === 'same') return <p>The release before it ({setLink}) held the same revision.</p>
  if (part.change !== 'changed') return <p>The release before it ({setLink}) held no map of this kind.</p>
  const c = part.diff
  return (
    <p>
      Against r{part.before.number}{part.before.mapId !== part.mapId ? ` of ${part.before.mapName}` : ''}, in the release before it ({setLink}): {c.changed.length} of {c.cellCount} cells changed
      {c.largestAbsolute && `; largest ${c.largestAbsolute.delta > 0 ? '+' : ''}${c.largestAbsolute.delta.toFixed(0)} N·m at ${c.largestAbsolute.pedalPct} % / ${c.largestAbsolute.speedKmh} km/h`}{' '}
      <Link href={`/maps/compare?a=${part.before.mapId}:${part.before.number}&b=${part.mapId}:${part.number}`} className="text-accent underline">compare surfaces</Link>
    </p>
  )
}

/** What this revision changes against the one of this map in the program's released set, largest changes first. */
export function ChangesSummary(props: {
  mapId: number
  number: number
  released: { number: number; setId: number; setNumber: number } | null
  changes: MapDiff | null
  /** When this revision is in the trucks now: the release it followed (null: the program's first release). */
  previous?: { comparison: ReleaseComparison | null; kind: 'drive' | 'regen' }
}) {
  const rel = props.released
  const setLink = rel && <Link href={`/sets/${rel.setId}`} className="text-accent underline">set {rel.setNumber}</Link>
  if (!rel) return <section className="card text-sm">No released map set holds a revision of this map; there is nothing in the trucks to compare with.</section>
  if (rel.number === props.number) {
    const prev = props.previous
    const part = prev?.comparison?.parts.find((p) => p.kind === prev.kind)
    return (
      <section className="card space-y-1 text-sm" data-testid="release-comparison">
        <p>This revision is in the trucks now, in the released {setLink}.</p>
        {prev && (prev.comparison && part ? <AgainstBefore before={prev.comparison.before} part={part} /> : <p>It came with the program&apos;s first release: there was no earlier release to compare with.</p>)}
      </section>
    )
  }
  if (!props.changes) return null
  const c = props.changes
  return (
    <section className="card space-y-2">
      <h2 className="font-semibold">
        Changes against r{rel.number}, in the trucks now in {setLink}{' '}
        <Link href={`/maps/compare?a=${props.mapId}:${rel.number}&b=${props.mapId}:${props.number}`} className="text-sm font-normal text-accent hover:underline">compare surfaces</Link>
      </h2>
      <p className="text-sm">
        {c.changed.length} of {c.cellCount} cells changed{c.axesDiffer ? ' (breakpoints differ; compared on the released breakpoints)' : ''}
        {c.largestAbsolute && `; largest ${c.largestAbsolute.delta > 0 ? '+' : ''}${c.largestAbsolute.delta.toFixed(0)} N·m at ${c.largestAbsolute.pedalPct} % / ${c.largestAbsolute.speedKmh} km/h`}
      </p>
      {c.changed.length > 0 && (
        <div className="overflow-x-auto">
          <table className="text-sm" data-testid="review-change-table">
            <thead className="text-left text-xs uppercase text-slate-500"><tr><th className="pr-4">Pedal %</th><th className="pr-4">km/h</th><th className="pr-4">Released N·m</th><th className="pr-4">This N·m</th><th>Change</th></tr></thead>
            <tbody>
              {c.changed.slice(0, 10).map((x) => (
                <tr key={`${x.row}:${x.col}`}><td>{x.pedalPct}</td><td>{x.speedKmh}</td><td>{x.before.toFixed(0)}</td><td>{x.after.toFixed(0)}</td><td>{x.delta > 0 ? '+' : ''}{x.delta.toFixed(0)}</td></tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  )
}

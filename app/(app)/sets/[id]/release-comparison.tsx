import Link from 'next/link'
import { formatTime } from '@/app/_components/format'
import type { PartChange, ReleaseComparison } from '@/app/_lib/sets/release-before'

const KIND = { drive: 'Drive map', regen: 'Regen map' } as const

function PartLine({ p }: { p: PartChange }) {
  if (p.change === 'none-now') return <li>{KIND[p.kind]}: none in this set.</li>
  if (p.change === 'none-before') return <li>{KIND[p.kind]}: the release before held none.</li>
  if (p.change === 'same') return <li>{KIND[p.kind]}: unchanged, {p.mapName} r{p.number}.</li>
  const d = p.diff
  const largest = d.largestAbsolute
  const sameMap = p.before.mapId === p.mapId
  return (
    <li>
      {KIND[p.kind]}: {sameMap ? `${p.mapName} r${p.before.number} → r${p.number}` : `${p.before.mapName} r${p.before.number} → ${p.mapName} r${p.number}`}
      {' — '}
      {d.changed.length} of {d.cellCount} cells changed
      {d.axesDiffer ? ' (breakpoints differ; compared on the earlier breakpoints)' : ''}
      {largest && `; largest ${largest.delta > 0 ? '+' : ''}${largest.delta.toFixed(0)} N·m at ${largest.pedalPct} % / ${largest.speedKmh} km/h`}
      {' · '}
      <Link href={`/maps/compare?a=${p.before.mapId}:${p.before.number}&b=${p.mapId}:${p.number}`} className="text-accent underline">compare</Link>
    </li>
  )
}

/** A released set against the release it followed in the trucks: what a driver will feel change. */
export function ReleaseComparisonView({ comparison, paramVersion }: { comparison: ReleaseComparison | null; paramVersion: number }) {
  return (
    <section className="card space-y-2 text-sm" aria-labelledby="release-before-heading" data-testid="release-comparison">
      <h2 id="release-before-heading" className="font-semibold">Against the release before it</h2>
      {!comparison ? (
        <p>This was the program&apos;s first release: there was no earlier release in the trucks to compare with.</p>
      ) : (
        <>
          {comparison.before.withdrawnAt ? (
            <p>
              The release before it was{' '}
              <Link href={`/sets/${comparison.before.setId}`} className="text-accent underline">Set {comparison.before.setNumber}</Link>, released {formatTime(comparison.before.releasedAt)} and withdrawn {formatTime(comparison.before.withdrawnAt)}.
            </p>
          ) : (
            <p>
              Before this release the trucks ran{' '}
              <Link href={`/sets/${comparison.before.setId}`} className="text-accent underline">Set {comparison.before.setNumber}</Link>, released {formatTime(comparison.before.releasedAt)}.
            </p>
          )}
          <ul className="ml-5 list-disc space-y-1">
            {comparison.parts.map((p) => <PartLine key={p.kind} p={p} />)}
            <li>
              Parameters: {comparison.before.paramVersion === paramVersion ? `unchanged, version ${paramVersion}.` : `version ${comparison.before.paramVersion} → ${paramVersion}.`}
            </li>
          </ul>
        </>
      )}
    </section>
  )
}

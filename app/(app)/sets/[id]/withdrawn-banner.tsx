import { formatTime } from '@/app/_components/format'

/** Shown at the top of a set whose release was withdrawn: nobody may flash it, and everyone must see why. */
export function WithdrawnBanner({ setNumber, at, by, reason }: { setNumber: number; at: Date; by: string | null; reason: string | null }) {
  return (
    <section role="alert" aria-labelledby="withdrawn-heading" className="rounded-lg border-2 border-danger bg-red-50 p-4 text-danger" data-testid="withdrawn-banner">
      <h2 id="withdrawn-heading" className="text-lg font-bold">The release of Set {setNumber} was withdrawn — do not flash it into any truck</h2>
      <p className="mt-1 text-sm text-ink">
        Withdrawn {formatTime(at)}
        {by ? ` by ${by}` : ''}.
      </p>
      <p className="mt-1 text-sm break-words text-ink">
        <span className="font-semibold">Reason:</span> {reason ?? 'no reason recorded'}
      </p>
    </section>
  )
}

/**
 * Choose two revisions to compare: a plain GET form, so it works before any script loads. Only
 * revisions of the same kind and vehicle program can be compared; the page says so if not.
 */
import type { MapSummary } from '@/db/queries/maps'

function options(maps: MapSummary[]) {
  return maps.flatMap((m) =>
    Array.from({ length: m.latestNumber ?? 0 }, (_, i) => (m.latestNumber ?? 0) - i).map((n) => (
      <option key={`${m.id}:${n}`} value={`${m.id}:${n}`}>{`${m.programName} · ${m.name} (${m.kind}) · r${n}`}</option>
    )),
  )
}

export function ComparePicker({ maps, a, b, problem }: { maps: MapSummary[]; a?: string; b?: string; problem?: string }) {
  return (
    <form method="get" action="/maps/compare" className="card space-y-3">
      {problem && <p role="alert" className="rounded bg-red-50 px-3 py-2 text-sm text-danger">{problem}</p>}
      <div className="grid grid-cols-[minmax(0,1fr)] gap-3 sm:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <label>
          <span className="label">A (before)</span>
          <select name="a" className="field" defaultValue={a}>{options(maps)}</select>
        </label>
        <label>
          <span className="label">B (after)</span>
          <select name="b" className="field" defaultValue={b}>{options(maps)}</select>
        </label>
      </div>
      <button type="submit" className="btn-primary">Compare</button>
    </form>
  )
}

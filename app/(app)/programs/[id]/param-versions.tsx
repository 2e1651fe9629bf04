import Link from 'next/link'
import { formatTime } from '@/app/_components/format'
import type { ParamVersion } from '@/db/queries/param-versions'
import { versionDiff } from '../param-diff'

/** The program's parameter versions, newest first: number, when, who and why. */
export function ParamVersionHistory(props: { programId: number; versions: ParamVersion[] }) {
  return (
    <section className="card space-y-2" aria-labelledby="versions-title" id="versions">
      <h2 id="versions-title" className="font-semibold">Parameter versions</h2>
      <p className="text-sm text-slate-600">
        Every change to the parameters or release conditions makes a new version, which is never changed afterwards. A map
        set names the version it was made with.
      </p>
      <ol className="divide-y divide-line text-sm" data-testid="param-versions">
        {props.versions.map((v, i) => (
          <li key={v.id} className="py-2" data-testid={`param-version-${v.number}`}>
            <p className="flex flex-wrap items-baseline gap-x-2">
              <span className="font-semibold">Version {v.number}</span>
              {i === 0 && <span className="rounded bg-accent-soft px-1.5 text-xs font-semibold text-accent">current</span>}
              <span className="text-slate-600">
                {formatTime(v.createdAt)} · {v.createdByName ?? 'unknown'}
              </span>
              {v.number > 1 && props.versions.some((o) => o.number === v.number - 1) && (
                <Link href={`/programs/${props.programId}?from=${v.number - 1}&to=${v.number}#changes`} className="text-accent hover:underline">
                  changes from version {v.number - 1}
                </Link>
              )}
            </p>
            <p className="break-words text-slate-800">“{v.reason}”</p>
          </li>
        ))}
      </ol>
    </section>
  )
}

/**
 * Two versions side by side, field by field. A plain GET form (`?from=&to=`), so it works without
 * JavaScript and the link can be shared.
 */
export function ParamVersionDiff(props: { programId: number; versions: ParamVersion[]; from: number | null; to: number | null }) {
  const { versions } = props
  const a = versions.find((v) => v.number === props.from)
  const b = versions.find((v) => v.number === props.to)
  const rows = a && b ? versionDiff(a, b) : []
  const missing = [props.from !== null && !a ? props.from : null, props.to !== null && !b ? props.to : null].filter((n): n is number => n !== null)
  // The reasons of the versions that lie between the two, oldest first.
  const [lo, hi] = a && b ? [Math.min(a.number, b.number), Math.max(a.number, b.number)] : [0, 0]
  const between = versions.filter((v) => v.number > lo && v.number <= hi).sort((x, y) => x.number - y.number)
  const select = (name: 'from' | 'to', label: string, value: number | null) => (
    <div className="min-w-0 flex-1">
      <label htmlFor={`diff-${name}`} className="label">{label}</label>
      <select id={`diff-${name}`} name={name} className="field" defaultValue={value ?? undefined}>
        {versions.map((v) => (
          <option key={v.id} value={v.number}>
            Version {v.number} — {formatTime(v.createdAt).slice(0, 10)}
          </option>
        ))}
      </select>
    </div>
  )
  return (
    <section className="card space-y-3" aria-labelledby="changes-title" id="changes">
      <h2 id="changes-title" className="font-semibold">Changes between two versions</h2>
      {versions.length < 2 ? (
        <p className="text-sm text-slate-600">There is only one version so far; nothing to compare.</p>
      ) : (
        // Keyed by the choice, so the selects show it again after a client-side navigation (a history link).
        <form key={`${props.from}-${props.to}`} method="get" action={`/programs/${props.programId}#changes`} className="flex flex-wrap items-end gap-3">
          {select('from', 'From', a ? a.number : null)}
          {select('to', 'To', b ? b.number : null)}
          <button type="submit" className="btn">Show changes</button>
        </form>
      )}
      {versions.length >= 2 && missing.length > 0 && (
        <p role="status" className="text-sm text-danger">
          There is no version {missing.join(' or ')} of this program; pick two versions above.
        </p>
      )}
      {a && b && (
        <div className="space-y-2" data-testid="param-diff">
          <p className="text-sm">
            From version {a.number} to version {b.number}:{' '}
            {a.number === b.number ? 'the same version.' : rows.length === 0 ? 'no field changed.' : `${rows.length} field${rows.length === 1 ? '' : 's'} changed.`}
          </p>
          {between.length > 0 && (
            <div className="text-sm text-slate-600">
              <p>{between.length === 1 ? 'Reason given:' : 'Reasons given, oldest first:'}</p>
              <ul className="ml-4 list-disc">
                {between.map((v) => (
                  <li key={v.id} className="break-words">
                    version {v.number}: <span className="text-slate-800">“{v.reason}”</span>
                  </li>
                ))}
              </ul>
            </div>
          )}
          {rows.length > 0 && (
            <ul className="divide-y divide-line text-sm">
              {rows.map((r) => (
                <li key={r.path} className="py-1.5" data-testid={`diff-${r.path}`}>
                  <p>
                    <span className="font-medium">{r.label}</span>
                    {r.unit && r.unit !== ':1' && <span className="text-slate-500"> ({r.unit})</span>}{' '}
                    <code className="break-all text-xs text-slate-500">{r.path}</code>
                  </p>
                  <p className="break-words">
                    <span className="text-slate-600">{r.from}</span> <span aria-hidden>→</span>
                    <span className="sr-only">becomes</span> <span className="font-semibold">{r.to}</span>
                  </p>
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
    </section>
  )
}

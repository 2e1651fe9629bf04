import { requirePageUser } from '@/app/_lib/auth/page-access'
import { formatTime } from '@/app/_components/format'
import { listAudit } from '@/db/queries/audit'
import { auditFilterSchema } from '@/app/_schemas/audit'
import { AUDIT_READERS } from '@/domain/roles'

export const metadata = { title: 'Audit trail' }

export default async function AuditPage(props: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser(AUDIT_READERS)
  const q = await props.searchParams
  // The API's own filter schema: a date out of range (year 0, 275760) or an unknown filter is said
  // on the page, not a 500 and not silently ignored.
  const given = Object.fromEntries(Object.entries(q).filter((e): e is [string, string] => typeof e[1] === 'string' && e[1] !== ''))
  const parsed = auditFilterSchema.safeParse(given)
  const problems = parsed.success ? [] : parsed.error.issues.map((i) => i.message)
  const str = (k: string): string | undefined => given[k]
  const filter = { entityType: str('entityType'), action: str('action') }
  const rows = parsed.success ? await listAudit(parsed.data) : []
  const csvQuery = new URLSearchParams(Object.entries({ ...q, format: 'csv' }).filter((e): e is [string, string] => typeof e[1] === 'string' && e[1] !== '')).toString()
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Audit trail</h1>
      <form className="card grid gap-3 sm:grid-cols-5" method="get">
        <div>
          <label htmlFor="entityType" className="label">What</label>
          <select id="entityType" name="entityType" defaultValue={filter.entityType ?? ''} className="field">
            <option value="">everything</option>
            {['map', 'vehicle_program', 'drive_report', 'user'].map((t) => <option key={t} value={t}>{t.replace('_', ' ')}</option>)}
          </select>
        </div>
        <div>
          <label htmlFor="action" className="label">Action starts with</label>
          <input id="action" name="action" defaultValue={filter.action ?? ''} className="field" placeholder="revision." />
        </div>
        <div>
          <label htmlFor="since" className="label">From</label>
          <input id="since" name="since" type="date" defaultValue={str('since') ?? ''} className="field" />
        </div>
        <div>
          <label htmlFor="until" className="label">Until</label>
          <input id="until" name="until" type="date" defaultValue={str('until') ?? ''} className="field" />
        </div>
        <div className="flex items-end gap-2">
          <button type="submit" className="btn-primary">Filter</button>
          <a className="btn" href={`/api/audit?${csvQuery}`}>Export CSV</a>
        </div>
      </form>
      {problems.length > 0 && (
        <div role="alert" data-testid="audit-filter-problems" className="card border-red-300 bg-red-50 text-sm text-red-800">
          <p className="font-medium">These filters cannot be used:</p>
          <ul className="list-disc pl-5">{problems.map((m) => <li key={m}>{m}</li>)}</ul>
        </div>
      )}
      <div className="card overflow-x-auto p-0">
        <table className="w-full text-sm" data-testid="audit-table">
          <thead className="bg-slate-50 text-left text-xs uppercase text-slate-600">
            <tr><th className="px-3 py-2">When</th><th className="px-3 py-2">Who</th><th className="px-3 py-2">Action</th><th className="px-3 py-2">On</th><th className="px-3 py-2">From</th><th className="px-3 py-2">Details</th></tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.id} className="border-t border-line align-top">
                <td className="px-3 py-1.5 whitespace-nowrap">{formatTime(r.at)}</td>
                <td className="px-3 py-1.5">{r.actorName ?? '—'}</td>
                <td className="px-3 py-1.5 font-mono text-xs">{r.action}</td>
                <td className="px-3 py-1.5">{r.entityType} {r.entityId ?? ''}</td>
                <td className="px-3 py-1.5 font-mono text-xs">{r.ip ?? ''}</td>
                <td className="px-3 py-1.5 font-mono text-xs break-all">{JSON.stringify(r.details)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  )
}

import { requirePageUser } from '@/app/_lib/auth/page-access'
import { formatTime } from '@/app/_components/format'
import Link from 'next/link'
import { countAudit, listAudit } from '@/db/queries/audit'
import { auditSubjects, subjectOf } from '@/db/queries/audit-subjects'
import { AUDIT_PAGE_SIZE, auditFilterSchema } from '@/app/_schemas/audit'
import { auditActionLabel, auditSentence } from '@/domain/audit-text'
import { AUDIT_READERS } from '@/domain/roles'

const SUBJECT_TYPES = [
  ['map', 'maps'],
  ['map_set', 'map sets'],
  ['vehicle_program', 'vehicle programs'],
  ['drive_report', 'drive reports'],
  ['user', 'users and sign-ins'],
] as const

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
  // The page shows AUDIT_PAGE_SIZE rows unless the address names a limit.
  const pageSize = parsed.success && given.limit ? parsed.data.limit : AUDIT_PAGE_SIZE
  const page = parsed.success ? parsed.data.page : 1
  const dbFilter = parsed.success ? { ...parsed.data, limit: pageSize, offset: (page - 1) * pageSize } : null
  const [rows, total] = dbFilter ? await Promise.all([listAudit(dbFilter), countAudit(dbFilter)]) : [[], 0]
  const subjects = await auditSubjects(rows)
  const pages = Math.max(1, Math.ceil(total / pageSize))
  const pageHref = (n: number) => `/admin/audit?${new URLSearchParams({ ...given, page: String(n) }).toString()}`
  const csvQuery = new URLSearchParams(Object.entries({ ...q, format: 'csv' }).filter((e): e is [string, string] => typeof e[1] === 'string' && e[1] !== '')).toString()
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Audit trail</h1>
      <form className="card grid gap-3 sm:grid-cols-5" method="get">
        <div>
          <label htmlFor="entityType" className="label">What</label>
          <select id="entityType" name="entityType" defaultValue={filter.entityType ?? ''} className="field">
            <option value="">everything</option>
            {SUBJECT_TYPES.map(([t, label]) => <option key={t} value={t}>{label}</option>)}
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
            <tr><th className="px-3 py-2">When</th><th className="px-3 py-2">Who</th><th className="px-3 py-2">What</th><th className="px-3 py-2">On</th><th className="px-3 py-2">Details</th><th className="px-3 py-2">From</th></tr>
          </thead>
          <tbody>
            {rows.map((r) => {
              const subject = subjectOf(subjects, r)
              const sentence = auditSentence(r.action, r.details)
              return (
                <tr key={r.id} className="border-t border-line align-top" data-testid="audit-row">
                  <td className="px-3 py-1.5 whitespace-nowrap">{formatTime(r.at)}</td>
                  <td className="px-3 py-1.5">{r.actorName ?? 'the system'}</td>
                  <td className="px-3 py-1.5">{auditActionLabel(r.action)}</td>
                  <td className="px-3 py-1.5">{subject.href ? <Link href={subject.href} className="text-accent underline">{subject.name}</Link> : subject.name}</td>
                  <td className="max-w-md px-3 py-1.5 break-words">
                    {sentence}
                    {Object.keys(r.details).length > 0 && (
                      <details className="text-xs">
                        <summary className="cursor-pointer text-slate-600">Raw data</summary>
                        <p className="text-slate-600">Action <code>{r.action}</code> on {r.entityType} {r.entityId ?? ''}</p>
                        <pre className="whitespace-pre-wrap break-all">{JSON.stringify(r.details, null, 2)}</pre>
                      </details>
                    )}
                  </td>
                  <td className="px-3 py-1.5 font-mono text-xs">{r.ip ?? ''}</td>
                </tr>
              )
            })}
          </tbody>
        </table>
        {rows.length === 0 && problems.length === 0 && <p className="px-3 py-3 text-sm text-slate-600">Nothing matches these filters{page > 1 ? ' on this page' : ''}.</p>}
      </div>
      <nav aria-label="Pages of the audit trail" className="flex flex-wrap items-center gap-3 text-sm" data-testid="audit-paging">
        <span>
          Page {Math.min(page, pages)} of {pages} · {total} entr{total === 1 ? 'y' : 'ies'}
        </span>
        {page > 1 && <Link href={pageHref(Math.min(page - 1, pages))} className="btn" rel="prev">Newer</Link>}
        {page < pages && <Link href={pageHref(page + 1)} className="btn" rel="next">Older</Link>}
      </nav>
    </div>
  )
}

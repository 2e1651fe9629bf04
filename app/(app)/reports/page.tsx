import Link from 'next/link'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { idOrNull } from '@/app/_lib/http/page-params'
import { listReports } from '@/db/queries/reports'
import { ReportTable } from './report-table'

export const metadata = { title: 'Drive reports' }

export default async function ReportsPage(props: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser()
  const q = await props.searchParams
  const openOnly = q.safety === 'open'
  // ?set=<id>: the reports on one set (linked from the set's page)
  const setId = idOrNull(q.set, 'Set id') ?? undefined
  const reports = await listReports({ openSafety: openOnly, setId })
  const href = (o: { set?: number; safety?: boolean }) => {
    const p = new URLSearchParams()
    if (o.set) p.set('set', String(o.set))
    if (o.safety) p.set('safety', 'open')
    return p.size ? `/reports?${p}` : '/reports'
  }
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-bold">Drive reports{setId && reports[0] ? ` on set ${reports[0].setNumber}` : ''}</h1>
        {setId && <Link href={href({ safety: openOnly })} className="btn">All sets</Link>}
        <Link href={href({ set: setId, safety: !openOnly })} className="btn">
          {openOnly ? 'Show all' : 'Open safety concerns only'}
        </Link>
        {user.role === 'test_driver' && (
          <Link href={setId ? `/reports/new?set=${setId}` : '/reports/new'} className="btn-primary ml-auto">File a report</Link>
        )}
      </div>
      <ReportTable reports={reports} />
    </div>
  )
}

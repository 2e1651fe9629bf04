import Link from 'next/link'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { listReports } from '@/db/queries/reports'
import { ReportTable } from './report-table'

export const metadata = { title: 'Drive reports' }

export default async function ReportsPage(props: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser()
  const q = await props.searchParams
  const openOnly = q.safety === 'open'
  const reports = await listReports({ openSafety: openOnly })
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-bold">Drive reports</h1>
        <Link href={openOnly ? '/reports' : '/reports?safety=open'} className="btn">
          {openOnly ? 'Show all' : 'Open safety concerns only'}
        </Link>
        {user.role === 'test_driver' && (
          <Link href="/reports/new" className="btn-primary ml-auto">File a report</Link>
        )}
      </div>
      <ReportTable reports={reports} />
    </div>
  )
}

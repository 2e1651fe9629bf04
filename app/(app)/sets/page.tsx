import Link from 'next/link'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { idOrNull } from '@/app/_lib/http/page-params'
import { formatTime } from '@/app/_components/format'
import { listPrograms } from '@/db/queries/programs'
import { listSets } from '@/db/queries/sets'
import { SetStatusBadge } from './status-badge'

export const metadata = { title: 'Map sets' }

const part = (name: string | null, number: number | null) => (name && number ? `${name} r${number}` : '—')

export default async function SetsPage(props: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser()
  const programId = idOrNull((await props.searchParams).program, 'Program id')
  const [programs, sets] = await Promise.all([listPrograms(), listSets(programId ? { programId } : {})])
  const program = programs.find((p) => p.id === programId)
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-bold">Map sets</h1>
        {EDITORS.includes(user.role) && (
          <Link href={program ? `/sets/new?program=${program.id}` : '/sets/new'} className="btn-primary ml-auto">
            New set
          </Link>
        )}
      </div>
      <p className="text-sm text-slate-600">
        A set is what one truck is flashed with: one drive map revision, one regen map revision and one parameter version of the vehicle program. Drives, reports and releases are on sets.
      </p>
      {programs.length > 1 && (
        <nav aria-label="Filter by vehicle program" className="flex flex-wrap gap-1 text-sm">
          <Link href="/sets" aria-current={program ? undefined : 'page'} className={`rounded px-2 py-1 ${program ? 'hover:bg-accent-soft' : 'bg-accent text-white'}`}>
            All programs
          </Link>
          {programs.map((p) => (
            <Link key={p.id} href={`/sets?program=${p.id}`} aria-current={p.id === program?.id ? 'page' : undefined} className={`rounded px-2 py-1 ${p.id === program?.id ? 'bg-accent text-white' : 'hover:bg-accent-soft'}`}>
              {p.name}
            </Link>
          ))}
        </nav>
      )}
      {programId && !program && <p role="status" className="text-sm text-slate-600">No vehicle program has id {programId}.</p>}
      {sets.length === 0 ? (
        <p className="text-slate-600">{program ? `${program.name} has no map sets yet.` : 'No map sets yet.'}</p>
      ) : (
        <div className="card overflow-x-auto p-0">
          <table className="w-full text-sm" data-testid="sets-table">
            <caption className="sr-only">Map sets{program ? ` of ${program.name}` : ''}, newest first</caption>
            <thead className="bg-slate-50 text-left text-xs uppercase text-slate-600">
              <tr>
                <th scope="col" className="px-3 py-2">Program</th>
                <th scope="col" className="px-3 py-2">Set</th>
                <th scope="col" className="px-3 py-2">Drive map</th>
                <th scope="col" className="px-3 py-2">Regen map</th>
                <th scope="col" className="px-3 py-2">Parameters</th>
                <th scope="col" className="px-3 py-2">Status</th>
                <th scope="col" className="px-3 py-2">Reports</th>
                <th scope="col" className="px-3 py-2">Created</th>
              </tr>
            </thead>
            <tbody>
              {sets.map((s) => (
                <tr key={s.id} className="border-t border-line" data-testid={`set-row-${s.id}`}>
                  <td className="px-3 py-2">{s.programName}</td>
                  <th scope="row" className="px-3 py-2 text-left font-medium whitespace-nowrap">
                    <Link href={`/sets/${s.id}`} className="text-accent hover:underline">Set {s.number}</Link>
                  </th>
                  <td className="px-3 py-2">{part(s.driveMapName, s.driveNumber)}</td>
                  <td className="px-3 py-2">{part(s.regenMapName, s.regenNumber)}</td>
                  <td className="px-3 py-2 whitespace-nowrap">v{s.paramVersion}</td>
                  <td className="px-3 py-2"><SetStatusBadge status={s.status} /></td>
                  <td className="px-3 py-2">{s.reports}</td>
                  <td className="px-3 py-2 whitespace-nowrap">{formatTime(s.createdAt)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  )
}

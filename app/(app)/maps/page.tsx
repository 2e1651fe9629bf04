import Link from 'next/link'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { listMaps } from '@/db/queries/maps'
import { formatTime } from '@/app/_components/format'

export const metadata = { title: 'Maps' }

export default async function MapsPage() {
  const user = await requirePageUser()
  const maps = await listMaps()
  const programs = [...new Set(maps.map((m) => m.programName))]
  return (
    <div className="space-y-5">
      <div className="flex items-center gap-3">
        <h1 className="text-2xl font-bold">Maps</h1>
        {EDITORS.includes(user.role) && (
          <Link href="/maps/new" className="btn-primary ml-auto">
            New map
          </Link>
        )}
      </div>
      {maps.length === 0 && <p className="text-slate-600">No maps yet.</p>}
      {programs.map((program) => (
        <section key={program} className="card">
          <h2 className="mb-2 font-semibold">{program}</h2>
          <table className="w-full text-sm">
            <thead className="text-left text-xs uppercase text-slate-500">
              <tr>
                <th className="py-1">Map</th>
                <th>Kind</th>
                <th>Latest revision</th>
                <th>Saved</th>
              </tr>
            </thead>
            <tbody>
              {maps
                .filter((m) => m.programName === program)
                .map((m) => (
                  <tr key={m.id} className="border-t border-line">
                    <td className="py-1.5">
                      <Link href={`/maps/${m.id}`} className="font-medium text-accent hover:underline">
                        {m.name}
                      </Link>
                    </td>
                    <td>{m.kind === 'drive' ? 'Drive (accelerator)' : 'Regen (brake pedal)'}</td>
                    <td>{m.latestNumber ? `r${m.latestNumber}` : '—'}</td>
                    <td>{m.latestAt ? formatTime(m.latestAt) : '—'}</td>
                  </tr>
                ))}
            </tbody>
          </table>
        </section>
      ))}
    </div>
  )
}

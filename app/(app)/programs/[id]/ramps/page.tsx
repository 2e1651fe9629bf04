import Link from 'next/link'
import { notFound } from 'next/navigation'
import { formatTime } from '@/app/_components/format'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { idOrNull, pageId } from '@/app/_lib/http/page-params'
import { getProgram } from '@/db/queries/programs'
import { listRampVersions } from '@/db/queries/ramp-versions'
import { starterRamps } from '@/maps/ramps'
import { RampEditor } from './ramp-editor'
import { RampTable } from '@/app/_components/ramp-table'

export const metadata = { title: 'Torque ramp limits' }

/** /programs/:id/ramps[?saved=N] — the program's torque ramp limits: the latest version, a new one, the history. */
export default async function RampsPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser()
  const id = pageId((await params).id, 'Program id')
  const [program, versions] = await Promise.all([getProgram(id), listRampVersions(id)])
  if (!program) notFound()
  const saved = idOrNull((await searchParams).saved, 'Saved version')
  const latest = versions[0] ?? null
  const canEdit = EDITORS.includes(user.role)
  return (
    <div className="space-y-4">
      <div>
        <p className="text-sm text-slate-500">
          <Link href="/programs" className="hover:underline">Vehicle programs</Link> ·{' '}
          <Link href={`/programs/${program.id}`} className="hover:underline">{program.name}</Link>
        </p>
        <h1 className="text-2xl font-bold">Torque ramp limits</h1>
        <p className="max-w-3xl text-sm text-slate-600">
          How fast the controller lets the motor torque request rise (tip-in) and fall (tip-out, into regen too), over road
          speed, and the slower rate through the band around zero torque where the driveline lash is taken up. A map set holds
          one version, which never changes; a change makes a new version and new sets take it.
        </p>
      </div>
      {saved !== null && (
        <p role="status" className="rounded bg-accent-soft px-3 py-2 text-sm">
          Saved as ramp version {saved}. New map sets of {program.name} take it; existing sets keep theirs.
        </p>
      )}
      {latest ? (
        <section className="card space-y-2" aria-labelledby="current-ramps">
          <h2 id="current-ramps" className="font-semibold">Version {latest.number} (latest)</h2>
          <RampTable limits={latest.limits} />
        </section>
      ) : (
        <p className="card text-sm">No ramp limits yet: sets of this program hold none, and the controller keeps the ramps it has.</p>
      )}
      {canEdit ? (
        <RampEditor programId={program.id} initial={latest?.limits ?? starterRamps(program.params.motorPeakTorqueNm)} fromVersion={latest?.number ?? null} />
      ) : (
        <p className="text-sm text-slate-600">Calibration and lead engineers make new ramp versions.</p>
      )}
      <section className="card space-y-2" aria-labelledby="ramp-history">
        <h2 id="ramp-history" className="font-semibold">Ramp versions</h2>
        {versions.length === 0 ? (
          <p className="text-sm text-slate-600">None yet.</p>
        ) : (
          <ol className="divide-y divide-line text-sm" data-testid="ramp-versions">
            {versions.map((v) => (
              <li key={v.id} className="py-2">
                <p className="flex flex-wrap gap-x-2">
                  <span className="font-semibold">Version {v.number}</span>
                  <span className="text-slate-600">{formatTime(v.createdAt)} · {v.createdByName ?? 'unknown'}</span>
                </p>
                <p className="break-words">“{v.reason}”</p>
              </li>
            ))}
          </ol>
        )}
      </section>
    </div>
  )
}

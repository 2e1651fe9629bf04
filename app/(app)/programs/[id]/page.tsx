import Link from 'next/link'
import { notFound } from 'next/navigation'
import { idOrNull, pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { PROGRAM_EDITORS } from '@/app/_lib/auth/roles'
import { listParamVersions } from '@/db/queries/param-versions'
import { getProgram } from '@/db/queries/programs'
import { ProgramForm } from '../program-form'
import { ProgramDetails } from './program-details'
import { chooseVersions } from '../param-diff'
import { ParamVersionDiff, ParamVersionHistory } from './param-versions'

export const metadata = { title: 'Vehicle program' }

/** /programs/:id[?saved=1&version=N][&from=&to=] — the program form, its parameter versions and the changes between two. */
export default async function ProgramPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>
  searchParams: Promise<Record<string, string | string[] | undefined>>
}) {
  const user = await requirePageUser()
  const id = pageId((await params).id, 'Program id')
  const [program, versions] = await Promise.all([getProgram(id), listParamVersions(id)])
  if (!program) notFound()
  const q = await searchParams
  const saved = q.saved === '1'
  const savedVersion = idOrNull(q.version, 'Version')
  const savedAs = saved && savedVersion !== null && versions.some((v) => v.number === savedVersion) ? savedVersion : null
  const chosen = chooseVersions(
    versions.map((v) => v.number),
    idOrNull(q.from, 'From version'),
    idOrNull(q.to, 'To version'),
  )
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3">
        <div>
          <p className="text-sm text-slate-500">
            <Link href="/programs" className="hover:underline">Vehicle programs</Link>
          </p>
          <h1 className="text-2xl font-bold">{program.name}</h1>
          <p className="text-sm text-slate-600">
            Parameter version {program.paramVersion} · <a href="#versions" className="text-accent hover:underline">history</a>
          </p>
        </div>
        <div className="flex flex-wrap gap-2 sm:ml-auto">
          <Link href={`/programs/${program.id}/ramps`} className="btn">Torque ramp limits</Link>
          <Link href={`/programs/${program.id}/physics`} className="btn">Traction and launch physics</Link>
        </div>
      </div>
      {saved && (
        <p role="status" className="rounded bg-accent-soft px-3 py-2 text-sm">
          {savedAs !== null ? `Saved as parameter version ${savedAs}.` : 'Saved.'}
        </p>
      )}
      {PROGRAM_EDITORS.includes(user.role) ? (
        <ProgramForm
          key={program.updatedAt.toISOString()}
          programId={program.id}
          paramVersion={program.paramVersion}
          initial={{ name: program.name, description: program.description, params: program.params, releaseConditions: program.releaseConditions }}
        />
      ) : (
        <ProgramDetails name={program.name} description={program.description} params={program.params} releaseConditions={program.releaseConditions} />
      )}
      <ParamVersionHistory programId={program.id} versions={versions} />
      <ParamVersionDiff programId={program.id} versions={versions} from={chosen.from} to={chosen.to} />
    </div>
  )
}

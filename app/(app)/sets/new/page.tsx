import Link from 'next/link'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { idOrNull } from '@/app/_lib/http/page-params'
import { formatTime } from '@/app/_components/format'
import { getRevisionWithMap, listMaps } from '@/db/queries/maps'
import { listParamVersions } from '@/db/queries/param-versions'
import { listRampVersions } from '@/db/queries/ramp-versions'
import { listPrograms } from '@/db/queries/programs'
import { listRevisions, type RevisionSummary } from '@/db/queries/revisions'
import { STATE_LABELS } from '@/domain/revision-states'
import { NewSetForm, type ProgramChoice, type RevisionChoice } from './new-set-form'

export const metadata = { title: 'New map set' }

/** Revisions offered per map, newest first; an older one comes in when the link names it. */
const REVISIONS_PER_MAP = 100

const option = (r: RevisionSummary): RevisionChoice => ({ id: r.id, number: r.number, state: STATE_LABELS[r.state], message: r.message, at: formatTime(r.createdAt) })

export default async function NewSetPage(props: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser(EDITORS)
  const q = await props.searchParams
  const wanted = { drive: idOrNull(q.drive, 'Drive revision id'), regen: idOrNull(q.regen, 'Regen revision id') }
  const [programs, maps] = await Promise.all([listPrograms(), listMaps()])
  const [revisions, versions, ramps] = await Promise.all([
    Promise.all(maps.map((m) => listRevisions(m.id, { limit: REVISIONS_PER_MAP }))),
    Promise.all(programs.map((p) => listParamVersions(p.id))),
    Promise.all(programs.map((p) => listRampVersions(p.id))),
  ])
  const choices: ProgramChoice[] = programs.map((p, i) => ({
    id: p.id,
    name: p.name,
    versions: versions[i].map((v) => ({ number: v.number, reason: v.reason, at: formatTime(v.createdAt) })),
    ramps: ramps[i].map((v) => ({ number: v.number, reason: v.reason, at: formatTime(v.createdAt) })),
    maps: maps.flatMap((m, j) =>
      m.programId !== p.id
        ? []
        : [{ id: m.id, name: m.name, kind: m.kind, revisions: revisions[j].map(option) }],
    ),
  }))
  // A revision named in the link but older than the ones listed is added at the end of its map's list.
  for (const id of [wanted.drive, wanted.regen]) {
    if (id === null || choices.some((p) => p.maps.some((m) => m.revisions.some((r) => r.id === id)))) continue
    const found = await getRevisionWithMap(id)
    const map = found && choices.find((p) => p.id === found.map.programId)?.maps.find((m) => m.id === found.map.id)
    if (found && map) map.revisions.push(option(found.revision))
  }
  const programOf = (revisionId: number | null) => choices.find((p) => p.maps.some((m) => m.revisions.some((r) => r.id === revisionId)))?.id
  const initialProgram = programOf(wanted.drive) ?? programOf(wanted.regen) ?? idOrNull(q.program, 'Program id') ?? undefined
  return (
    <div className="mx-auto max-w-2xl space-y-4">
      <p className="text-sm text-slate-500">
        <Link href="/sets" className="hover:underline">Map sets</Link>
      </p>
      <h1 className="text-2xl font-bold">New map set</h1>
      <p className="text-sm text-slate-600">
        Choose exactly what goes into the truck. A set never changes: a different revision or parameter version makes a different set. Drafts may be put in a set to be test-driven; only approved
        revisions can be released.
      </p>
      <NewSetForm programs={choices} initial={{ programId: initialProgram, driveRevisionId: wanted.drive ?? undefined, regenRevisionId: wanted.regen ?? undefined }} />
    </div>
  )
}

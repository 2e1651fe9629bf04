import Link from 'next/link'
import { notFound } from 'next/navigation'
import { SafetyCaution } from '@/app/_components/safety-caution'
import { pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { tractionTable } from '@/app/_lib/physics/traction'
import { batteryCornerRows } from '@/app/_lib/physics/battery-corners'
import { overlayFor } from '@/app/_lib/physics/overlay'
import { getMapWithLatest, getMapWithRevision, listMaps } from '@/db/queries/maps'
import { getProgram } from '@/db/queries/programs'
import { loadCasesFor } from '@/physics'
import { PhysicsWorkbench } from './physics-workbench'
import { initialState, type InitialPlots, type PhysicsState, type ProgramMap } from './physics-state'
import { BatteryCornersTable } from './battery-corners-table'

export const metadata = { title: 'Program physics' }

/**
 * The chosen revision's table and overlay for the first paint, so the plots need no request after
 * the page loads (both cached by revision on the server). Null when there is nothing to plot or the
 * choice is refused; the client then asks the overlay route, which names the problem.
 */
async function firstPlots(s: PhysicsState): Promise<InitialPlots | null> {
  if (!s.map) return null
  const found = await getMapWithRevision(s.map, s.rev)
  if (!found) return null
  const choice = { loadCase: s.loadCase, surface: s.surface, gradePct: s.gradePct }
  const { table } = found.revision
  try {
    // Judged as the overlay route judges it: the map's program, its design lateral acceleration.
    return { map: s.map, rev: s.rev, choice, table, overlay: overlayFor(found.map.programParams, table, choice, found.map.programReleaseConditions?.designLateralAccelMps2) }
  } catch {
    return null
  }
}

/** /programs/:id/physics[?map=&rev=&loadCase=&surface=&gradePct=&units=] — traction limits and launch / lift-off simulations. */
export default async function ProgramPhysicsPage(props: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser()
  const id = pageId((await props.params).id, 'Program id')
  const [program, listed, query] = await Promise.all([getProgram(id), listMaps({ programId: id }), props.searchParams])
  if (!program) notFound()
  const maps: ProgramMap[] = listed.filter((m) => m.latestNumber !== null).map((m) => ({ id: m.id, name: m.name, kind: m.kind, latestNumber: m.latestNumber ?? 1 }))
  const loadCases = loadCasesFor(program.params)
  const corners = program.releaseConditions.batteryCorners ?? []
  // Only read the regen maps' tables when there are corners to evaluate them at; both reads at once.
  const [initialPlots, regenFound] = await Promise.all([
    firstPlots(initialState(query, maps, loadCases)),
    Promise.all(corners.length ? maps.filter((m) => m.kind === 'regen').map((m) => getMapWithLatest(m.id)) : []),
  ])
  const regen = regenFound.filter((m) => m !== null).map((m) => ({ name: m.map.name, number: m.latest.number, table: m.latest.table }))
  return (
    <div className="space-y-4">
      <div>
        <p className="text-sm text-slate-500">
          <Link href="/programs" className="hover:underline">Vehicle programs</Link> · <Link href={`/programs/${program.id}`} className="hover:underline">{program.name}</Link>
        </p>
        <h1 className="text-2xl font-bold">Physics of {program.name}</h1>
        <p className="text-sm text-slate-600">Traction limits of the drive axle with load transfer, and launch and lift-off simulations on a map revision (see docs/physics.md).</p>
      </div>
      <SafetyCaution />
      <PhysicsWorkbench
        programId={program.id}
        loadCases={loadCases}
        maps={maps}
        initialTraction={tractionTable(program.params)}
        initialPlots={initialPlots}
        query={query}
        canEdit={EDITORS.includes(user.role)}
      />
      <BatteryCornersTable rows={batteryCornerRows(program.params, program.releaseConditions, regen)} minDecelMps2={program.releaseConditions.minLiftOffDecelMps2} hasTable={Boolean(program.params.batteryPowerTable)} />
    </div>
  )
}

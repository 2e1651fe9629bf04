import Link from 'next/link'
import { notFound } from 'next/navigation'
import { SafetyCaution } from '@/app/_components/safety-caution'
import { pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { tractionTable } from '@/app/_lib/physics/traction'
import { batteryCornerRows } from '@/app/_lib/physics/battery-corners'
import { getMapWithLatest, listMaps } from '@/db/queries/maps'
import { getProgram } from '@/db/queries/programs'
import { loadCasesFor } from '@/physics'
import { PhysicsWorkbench } from './physics-workbench'
import { BatteryCornersTable } from './battery-corners-table'

export const metadata = { title: 'Program physics' }

/** /programs/:id/physics[?map=&rev=&loadCase=&surface=&gradePct=&units=] — traction limits and launch / lift-off simulations. */
export default async function ProgramPhysicsPage(props: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser()
  const program = await getProgram(pageId((await props.params).id, 'Program id'))
  if (!program) notFound()
  const maps = (await listMaps({ programId: program.id })).filter((m) => m.latestNumber !== null)
  const corners = program.releaseConditions.batteryCorners ?? []
  // Only read the regen maps' tables when there are corners to evaluate them at.
  const regen = corners.length
    ? (await Promise.all(maps.filter((m) => m.kind === 'regen').map((m) => getMapWithLatest(m.id))))
        .filter((m) => m !== null)
        .map((m) => ({ name: m.map.name, number: m.latest.number, table: m.latest.table }))
    : []
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
        loadCases={loadCasesFor(program.params)}
        maps={maps.map((m) => ({ id: m.id, name: m.name, kind: m.kind, latestNumber: m.latestNumber ?? 1 }))}
        initialTraction={tractionTable(program.params)}
        query={await props.searchParams}
        canEdit={EDITORS.includes(user.role)}
      />
      <BatteryCornersTable rows={batteryCornerRows(program.params, program.releaseConditions, regen)} minDecelMps2={program.releaseConditions.minLiftOffDecelMps2} hasTable={Boolean(program.params.batteryPowerTable)} />
    </div>
  )
}

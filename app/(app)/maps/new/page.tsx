import { requirePageUser } from '@/app/_lib/auth/page-access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { listPrograms } from '@/db/queries/programs'
import { NewMapForm } from './new-map-form'

export const metadata = { title: 'New map' }

export default async function NewMapPage() {
  await requirePageUser(EDITORS)
  const programs = await listPrograms()
  return (
    <div className="mx-auto max-w-xl space-y-4">
      <h1 className="text-2xl font-bold">New map</h1>
      <NewMapForm programs={programs.map((p) => ({ id: p.id, name: p.name, params: p.params }))} />
    </div>
  )
}

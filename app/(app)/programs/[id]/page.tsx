import Link from 'next/link'
import { notFound } from 'next/navigation'
import { pageId } from '@/app/_lib/http/page-params'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { PROGRAM_EDITORS } from '@/app/_lib/auth/roles'
import { getProgram } from '@/db/queries/programs'
import { ProgramForm } from '../program-form'

export const metadata = { title: 'Vehicle program' }

export default async function ProgramPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>
  searchParams: Promise<Record<string, string | string[] | undefined>>
}) {
  const user = await requirePageUser()
  const program = await getProgram(pageId((await params).id, 'Program id'))
  if (!program) notFound()
  const saved = (await searchParams).saved === '1'
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-bold">{program.name}</h1>
        <Link href={`/programs/${program.id}/physics`} className="btn ml-auto">Traction and launch physics</Link>
      </div>
      {saved && <p role="status" className="rounded bg-accent-soft px-3 py-2 text-sm">Saved.</p>}
      <ProgramForm
        key={program.updatedAt.toISOString()}
        programId={program.id}
        readOnly={!PROGRAM_EDITORS.includes(user.role)}
        initial={{ name: program.name, description: program.description, params: program.params }}
      />
    </div>
  )
}

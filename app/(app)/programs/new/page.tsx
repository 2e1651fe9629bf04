import { requirePageUser } from '@/app/_lib/auth/page-access'
import { PROGRAM_EDITORS } from '@/app/_lib/auth/roles'
import { ProgramForm } from '../program-form'

export const metadata = { title: 'New vehicle program' }

export default async function NewProgramPage() {
  await requirePageUser(PROGRAM_EDITORS)
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">New vehicle program</h1>
      <ProgramForm />
    </div>
  )
}

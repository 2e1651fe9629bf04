import { requirePageUser } from '@/app/_lib/auth/page-access'
import { PROGRAM_EDITORS } from '@/app/_lib/auth/roles'
import { ProgramList } from './program-list'

export const metadata = { title: 'Vehicle programs' }

export default async function ProgramsPage() {
  const user = await requirePageUser()
  return <ProgramList canEdit={PROGRAM_EDITORS.includes(user.role)} />
}

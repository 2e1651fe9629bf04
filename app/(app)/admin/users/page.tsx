import { requirePageUser } from '@/app/_lib/auth/page-access'
import { UsersAdmin } from './users-admin'

export const metadata = { title: 'Users' }

export default async function UsersPage() {
  const me = await requirePageUser(['admin'])
  return <UsersAdmin myId={me.id} />
}

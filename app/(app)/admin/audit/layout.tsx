import type { ReactNode } from 'react'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { AUDIT_READERS } from '@/domain/roles'

// The access check runs here, above this segment's loading.tsx, so a full page load is still
// redirected with a real 307 before streaming starts. The page repeats it (the same cached read)
// because a layout is not re-rendered on client-side navigation.
export default async function AuditLayout({ children }: { children: ReactNode }) {
  await requirePageUser(AUDIT_READERS)
  return children
}

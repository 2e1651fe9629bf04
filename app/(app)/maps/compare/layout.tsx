import type { ReactNode } from 'react'
import { requirePageUser } from '@/app/_lib/auth/page-access'

// The sign-in check runs here, above this segment's loading.tsx, so a signed-out full page load is
// still redirected with a real 307 before streaming starts. The page repeats it (the same cached
// read) because a layout is not re-rendered on client-side navigation.
export default async function CompareLayout({ children }: { children: ReactNode }) {
  await requirePageUser()
  return children
}

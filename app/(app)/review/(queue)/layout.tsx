import type { ReactNode } from 'react'
import { requirePageUser } from '@/app/_lib/auth/page-access'

// The role check runs here, above this segment's loading.tsx, so a full page load by a driver is
// still redirected with a real 307 before streaming starts. The page repeats it (the same cached
// read) because a layout is not re-rendered on client-side navigation. The route group keeps this
// check off /review/:revisionId, which every role may read.
export default async function ReviewQueueLayout({ children }: { children: ReactNode }) {
  await requirePageUser(['lead_engineer', 'calibration_engineer'])
  return children
}

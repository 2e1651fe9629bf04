import { notFound } from 'next/navigation'
import type { ReactNode } from 'react'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { pageId } from '@/app/_lib/http/page-params'
import { setExists } from '@/db/queries/sets'

// The sign-in check and the 404 for an id that names no set run here, above this segment's
// loading.tsx: once the loading text has streamed, the status can no longer become 307 or 404.
export default async function SetLayout(props: { children: ReactNode; params: Promise<{ id: string }> }) {
  await requirePageUser()
  if (!(await setExists(pageId((await props.params).id, 'Set id')))) notFound()
  return props.children
}

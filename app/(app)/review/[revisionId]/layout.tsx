import { notFound } from 'next/navigation'
import type { ReactNode } from 'react'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { pageId } from '@/app/_lib/http/page-params'
import { getSavedRevision } from '@/db/queries/revisions'

// The sign-in check and the 404 for an id that names no revision run here, above this segment's
// loading.tsx: once the loading text has streamed, the status can no longer become 307 or 404.
export default async function ReviewRevisionLayout(props: { children: ReactNode; params: Promise<{ revisionId: string }> }) {
  await requirePageUser()
  if (!(await getSavedRevision(pageId((await props.params).revisionId, 'Revision id')))) notFound()
  return props.children
}

import { notFound } from 'next/navigation'
import type { ReactNode } from 'react'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { pageId } from '@/app/_lib/http/page-params'
import { reportExists } from '@/db/queries/reports'

// The sign-in check and the 404 for an id that names no report run here, above the loading.tsx of
// the report page and of its replay: once loading text has streamed, the status can no longer
// become 307 or 404. The report page sits in a route group so its loading text does not cover
// the edit page, whose driver-only check must stay a real redirect.
export default async function ReportLayout(props: { children: ReactNode; params: Promise<{ id: string }> }) {
  await requirePageUser()
  if (!(await reportExists(pageId((await props.params).id, 'Report id')))) notFound()
  return props.children
}

import { notFound } from 'next/navigation'
import type { ReactNode } from 'react'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { pageId } from '@/app/_lib/http/page-params'
import { programExists } from '@/db/queries/programs'

// As the set page's layout: sign-in and the 404 are decided before loading.tsx streams.
export default async function PhysicsLayout(props: { children: ReactNode; params: Promise<{ id: string }> }) {
  await requirePageUser()
  if (!(await programExists(pageId((await props.params).id, 'Program id')))) notFound()
  return props.children
}

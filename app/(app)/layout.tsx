import type { ReactNode } from 'react'
import { getPageUser } from '@/app/_lib/auth/page-access'
import { PageFrame } from '@/app/_components/page-frame'

/**
 * The signed-in app. The user is read once per request (cached): the header shows it, and each
 * page's requirePageUser(roles) reuses the same read for its own role check and redirects.
 */
export default async function AppLayout({ children }: { children: ReactNode }) {
  return <PageFrame user={await getPageUser()}>{children}</PageFrame>
}

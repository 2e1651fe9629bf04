import type { ReactNode } from 'react'
import type { SessionUser } from '@/app/_lib/auth/session'
import { SiteHeader } from './site-header'

/** Header and main column shared by the route groups and the top-level not-found page. */
export function PageFrame({ user, children }: { user: SessionUser | null; children: ReactNode }) {
  return (
    <>
      <SiteHeader user={user} />
      <main className="mx-auto max-w-7xl px-4 py-6">{children}</main>
    </>
  )
}

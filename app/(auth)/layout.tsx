import type { ReactNode } from 'react'
import { PageFrame } from '@/app/_components/page-frame'

/** Sign-in and password pages: the header of a signed-out visitor, without reading the session. */
export default function AuthLayout({ children }: { children: ReactNode }) {
  return <PageFrame user={null}>{children}</PageFrame>
}

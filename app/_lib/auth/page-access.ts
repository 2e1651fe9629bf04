import 'server-only'
import { cookies } from 'next/headers'
import { redirect } from 'next/navigation'
import { cache } from 'react'
import type { Role } from '@/domain/roles'
import { userFromCookieHeader, type SessionUser } from './session'

/**
 * The signed-in user for this request, or null. React `cache()` keeps the answer for the rest of
 * the render, so the group layout (header) and the page's access check share one read.
 */
export const getPageUser = cache(async (): Promise<SessionUser | null> => {
  const jar = await cookies()
  const header = jar.getAll().map((c) => `${c.name}=${encodeURIComponent(c.value)}`).join('; ')
  return userFromCookieHeader(header || null)
})

/**
 * For protected pages: the signed-in user, or a redirect to sign-in; a role outside `roles`
 * goes to the not-allowed page. Pages that read this render dynamically, never at build time.
 */
export async function requirePageUser(roles?: readonly Role[]): Promise<SessionUser> {
  const user = await getPageUser()
  if (!user) redirect('/signin')
  if (roles && !roles.includes(user.role)) redirect('/not-allowed')
  return user
}

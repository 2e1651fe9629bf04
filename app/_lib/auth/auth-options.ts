import 'server-only'
import type { AuthOptions } from 'next-auth'
import Credentials from 'next-auth/providers/credentials'
import { checkCredentials } from './credentials'
import { env } from '../config/env'
import { SESSION_MAX_AGE_S } from './session'

/** Secure cookies unless in development or served over plain http on a loopback address. */
export function secureCookies(url = env().NEXTAUTH_URL, nodeEnv = env().NODE_ENV): boolean {
  if (nodeEnv === 'development') return false
  if (!url) return true
  const u = new URL(url)
  const loopback = u.hostname === 'localhost' || u.hostname === '[::1]' || u.hostname.startsWith('127.')
  return !(u.protocol === 'http:' && loopback)
}

/** Built on first use, not at import, so `next build` needs no secret. */
export function authOptions(): AuthOptions {
  return {
    secret: env().authSecret,
    session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_S },
    // HttpOnly and SameSite=Lax always; Secure outside development, except plain http on this
    // machine's loopback (the demo), where a browser would drop a Secure cookie.
    useSecureCookies: secureCookies(),
    pages: { signIn: '/signin' },
    providers: [
      Credentials({
        name: 'Email and password',
        credentials: { email: { label: 'Email', type: 'email' }, password: { label: 'Password', type: 'password' } },
        async authorize(credentials, req) {
          const fwd = req?.headers?.['x-forwarded-for']
          const ip = (Array.isArray(fwd) ? fwd[0] : fwd)?.split(',')[0].trim() || null
          // A thrown error's message reaches the sign-in form (next-auth passes it as `error`).
          const user = await checkCredentials(credentials?.email ?? '', credentials?.password ?? '', ip)
          return user && { id: String(user.id), email: user.email, name: user.name, role: user.role }
        },
      }),
    ],
    callbacks: {
      jwt({ token, user }) {
        if (user && 'role' in user) token.role = user.role
        return token
      },
      session({ session, token }) {
        return { ...session, user: { ...session.user, id: token.sub, role: token.role } }
      },
    },
  }
}

import 'server-only'
import { randomUUID } from 'node:crypto'
import type { AuthOptions } from 'next-auth'
import Credentials from 'next-auth/providers/credentials'
import { revokeSession } from '@/db/queries/sessions'
import { checkCredentials } from './credentials'
import { env } from '../config/env'
import { SESSION_MAX_AGE_S, userForToken } from './session'

/** Secure cookies unless in development or served over plain http on a loopback address. */
export function secureCookies(url = env().NEXTAUTH_URL, nodeEnv = env().NODE_ENV): boolean {
  if (nodeEnv === 'development') return false
  if (!url) return true
  const u = new URL(url)
  const loopback = u.hostname === 'localhost' || u.hostname === '[::1]' || u.hostname.startsWith('127.')
  return !(u.protocol === 'http:' && loopback)
}

/** Thrown from the jwt callback for a session that was ended: next-auth then answers "no session" and clears the cookie. */
export class SessionEndedError extends Error {
  constructor() {
    super('The session has ended')
  }
}

/**
 * Built on first use, not at import, so `next build` needs no secret. `clientAddress` is the
 * caller's address as the route found it (see http/client-address.ts), for the sign-in throttle.
 */
export function authOptions(clientAddress: string | null = null): AuthOptions {
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
        async authorize(credentials) {
          // A thrown error's message reaches the sign-in form (next-auth passes it as `error`).
          const user = await checkCredentials(credentials?.email ?? '', credentials?.password ?? '', clientAddress)
          return user && { id: String(user.id), email: user.email, name: user.name, role: user.role, sessionVersion: user.sessionVersion }
        },
      }),
    ],
    callbacks: {
      async jwt({ token, user }) {
        if (user && 'role' in user) {
          // A new session: its own id (so signing out can end it alone) and the account's session version.
          return { ...token, role: user.role, sid: randomUUID(), sv: 'sessionVersion' in user ? user.sessionVersion : undefined }
        }
        // Every later use (the session endpoint) checks the session is still current.
        const current = await userForToken(token)
        if (!current) throw new SessionEndedError()
        return { ...token, role: current.role, name: current.name, email: current.email }
      },
      session({ session, token }) {
        return { ...session, user: { ...session.user, id: token.sub, role: token.role } }
      },
    },
    events: {
      async signOut({ token }) {
        const id = Number(token?.sub)
        if (typeof token?.sid === 'string' && Number.isInteger(id)) await revokeSession(token.sid, id, new Date(Date.now() + SESSION_MAX_AGE_S * 1000))
      },
    },
    logger: {
      // An ended session is an expected answer ("not signed in"), not a server error worth a stack trace.
      error(code, metadata) {
        if (code === 'JWT_SESSION_ERROR' && isSessionEnded(metadata)) return
        console.error(`[next-auth] ${code}`, metadata)
      },
      warn(code) {
        console.warn(`[next-auth] ${code}`)
      },
      debug() {},
    },
  }
}

function isSessionEnded(metadata: unknown): boolean {
  if (metadata instanceof SessionEndedError) return true
  const m = metadata as { error?: unknown } | null
  return m?.error instanceof SessionEndedError
}

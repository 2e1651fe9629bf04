import type { AuthOptions } from 'next-auth'
import Credentials from 'next-auth/providers/credentials'
import { checkCredentials } from './credentials'
import { env } from './env'
import { SESSION_MAX_AGE_S } from './session'

/** Built on first use, not at import, so `next build` needs no secret. */
export function authOptions(): AuthOptions {
  return {
    secret: env().authSecret,
    session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_S },
    pages: { signIn: '/signin' },
    providers: [
      Credentials({
        name: 'Email and password',
        credentials: { email: { label: 'Email', type: 'email' }, password: { label: 'Password', type: 'password' } },
        async authorize(credentials) {
          const user = await checkCredentials(credentials?.email ?? '', credentials?.password ?? '')
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

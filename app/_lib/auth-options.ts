import type { AuthOptions } from 'next-auth'
import Credentials from 'next-auth/providers/credentials'
import { getUserCredentials } from '@/db/queries/users'
import { recordAudit } from '@/db/queries/audit'
import { env } from './env'
import { verifyPassword } from './password'
import { SESSION_MAX_AGE_S } from './session'

export const authOptions: AuthOptions = {
  secret: env().authSecret,
  session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE_S },
  pages: { signIn: '/signin' },
  providers: [
    Credentials({
      name: 'Email and password',
      credentials: { email: { label: 'Email', type: 'email' }, password: { label: 'Password', type: 'password' } },
      async authorize(credentials) {
        const email = credentials?.email?.trim() ?? ''
        const password = credentials?.password ?? ''
        if (!email || !password) return null
        const user = await getUserCredentials(email)
        if (!user || user.disabled) return null
        if (!(await verifyPassword(user.passwordHash, password))) {
          await recordAudit({ actorId: user.id, action: 'auth.failed', entityType: 'user', entityId: user.id })
          return null
        }
        await recordAudit({ actorId: user.id, action: 'auth.signin', entityType: 'user', entityId: user.id })
        return { id: String(user.id), email: user.email, name: user.name, role: user.role }
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

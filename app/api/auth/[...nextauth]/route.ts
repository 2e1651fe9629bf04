// GET|POST /api/auth/* — next-auth's own sign-in, sign-out, CSRF and session endpoints (public by nature)
import NextAuth from 'next-auth'
import { authOptions } from '@/app/_lib/auth/auth-options'

type Ctx = { params: Promise<{ nextauth: string[] }> }

// Options are read per request so the secret is needed at run time only, never at build time.
async function handler(req: Request, ctx: Ctx): Promise<Response> {
  return NextAuth(authOptions())(req, ctx)
}

export { handler as GET, handler as POST }

// GET|POST /api/auth/* — next-auth's own sign-in, sign-out, CSRF and session endpoints (public by nature)
import { handleAuthRequest } from '@/app/_lib/auth/auth-route'

type Ctx = { params: Promise<{ nextauth: string[] }> }

// Options are read per request so the secret is needed at run time only, never at build time.
async function handler(req: Request, ctx: Ctx): Promise<Response> {
  return handleAuthRequest(req, (await ctx.params).nextauth)
}

export { handler as GET, handler as POST }

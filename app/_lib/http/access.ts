import 'server-only'
import { roleLabel, type Role } from '@/domain/roles'
import { errorResponse, ForbiddenError, UnauthorizedError } from './errors'
import { userFromCookieHeader, type SessionUser } from '../auth/session'
import { runWithRequestContext } from '@/db/request-context'
import { assertSameOrigin } from './same-origin'
import { clientAddress } from './client-address'

/** Who may call an entry point: listed roles, any signed-in user, or anyone. */
export type Access = readonly Role[] | 'signed-in' | 'public'

export interface RouteCtx<P> {
  user: SessionUser
  params: P
}

type NextCtx<P> = { params: Promise<P> }

export interface RouteOptions {
  /** Body types a state-changing call may send; JSON unless the route takes a file (see same-origin.ts). */
  accepts?: readonly string[]
}

/** Check a user against a declared access rule; throws 401/403 errors. */
export function assertAccess(user: SessionUser | null, access: Access): asserts user is SessionUser {
  if (access === 'public') return
  if (!user) throw new UnauthorizedError()
  if (access !== 'signed-in' && !access.includes(user.role))
    throw new ForbiddenError(`This needs the role ${access.map(roleLabel).join(' or ')}; you are signed in as ${roleLabel(user.role)}`)
}

/**
 * Wrap a route handler with its declared access: every `app/api` handler is built with this, so
 * the rule is visible in review and the access-matrix test can read it off the export.
 * Errors thrown inside become the one JSON error shape.
 */
export function withRole<P = Record<string, string>>(
  access: Exclude<Access, 'public'>,
  handler: (req: Request, ctx: RouteCtx<P>) => Promise<Response>,
  opts: RouteOptions = {},
) {
  const route = async (req: Request, ctx: NextCtx<P>): Promise<Response> => {
    try {
      const user = await userFromCookieHeader(req.headers.get('cookie'))
      assertAccess(user, access)
      assertSameOrigin(req, opts.accepts)
      const params = await ctx.params
      return noStore(await runWithRequestContext({ ip: clientAddress(req) }, () => handler(req, { user, params })))
    } catch (e) {
      return noStore(errorResponse(e))
    }
  }
  return Object.assign(route, { access })
}

/**
 * A route anyone may call (sign-in helpers such as a password reset). Declared like the others so
 * the access-matrix test sees it, with the same error handling.
 */
export function publicRoute<P = Record<string, string>>(handler: (req: Request, ctx: { params: P }) => Promise<Response>) {
  const route = async (req: Request, ctx: NextCtx<P>): Promise<Response> => {
    try {
      assertSameOrigin(req)
      const params = await ctx.params
      return noStore(await runWithRequestContext({ ip: clientAddress(req) }, () => handler(req, { params })))
    } catch (e) {
      return noStore(errorResponse(e))
    }
  }
  return Object.assign(route, { access: 'public' as const })
}

/**
 * API answers carry private data and change with every save: no browser or proxy may keep a copy.
 * A Response whose headers are frozen (Response.redirect) is copied.
 */
export function noStore(res: Response): Response {
  try {
    res.headers.set('cache-control', 'no-store')
    return res
  } catch {
    const copy = new Response(res.body, res)
    copy.headers.set('cache-control', 'no-store')
    return copy
  }
}

import { env } from '../config/env'
import { HttpError } from './errors'

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS'])

/** The origin the app is served from: NEXTAUTH_URL when set (behind a proxy it must be), else the request's own. */
function appOrigin(req: Request): string {
  const configured = env().NEXTAUTH_URL
  return configured ? new URL(configured).origin : new URL(req.url).origin
}

/**
 * Cross-site request forgery defence for state-changing calls. A page elsewhere (another site, or
 * another port of this host) can send a no-cors POST only as text/plain, a form or multipart, and
 * its browser marks it with its own Origin and Sec-Fetch-Site; so a body must be one of the route's
 * declared types (JSON unless it says otherwise), and Origin and Sec-Fetch-Site, when a browser sends
 * them, must name this app. Callers without them (scripts, tests) cannot carry a victim's cookie.
 */
export function assertSameOrigin(req: Request, accepts: readonly string[] = ['application/json']): void {
  if (SAFE_METHODS.has(req.method)) return
  const site = req.headers.get('sec-fetch-site')
  if (site && site !== 'same-origin' && site !== 'none') throw new HttpError(403, 'cross_origin', 'This request came from another site or port and was refused')
  const origin = req.headers.get('origin')
  if (origin && origin !== appOrigin(req)) throw new HttpError(403, 'cross_origin', `This request came from ${origin}, not from this app, and was refused`)
  const type = (req.headers.get('content-type') ?? '').split(';')[0].trim().toLowerCase()
  if (!accepts.includes(type)) throw new HttpError(415, 'unsupported_media_type', `Send this request as ${accepts.join(' or ')}${type ? `, not ${type}` : ''}`)
}

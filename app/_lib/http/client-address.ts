import { env } from '../config/env'

/**
 * The header Mapwright's own server (scripts/server.mjs) sets on every request to the socket's
 * peer address, overwriting anything a client sent under that name.
 */
export const PEER_HEADER = 'x-mapwright-peer'
/** Set by that server in this process: without it (e.g. `next dev`), the header is not trusted. */
export const PEER_STAMP = Symbol.for('mapwright.peer-header-stamped')

const plain = (a: string) => a.trim().replace(/^::ffff:(?=\d+\.\d+\.\d+\.\d+$)/, '').replace(/^\[(.*)\]$/, '$1')

/**
 * The client's address. Forwarding headers are believed only when the connection itself came from
 * a configured trusted proxy; then X-Forwarded-For is read from the right, skipping trusted proxies,
 * and the first other hop is the client (a client can prepend anything, but not past its proxy).
 */
export function resolveClientAddress(peer: string | null, forwardedFor: string | null, trusted: readonly string[]): string | null {
  if (!peer) return null
  const set = new Set(trusted.map(plain))
  let current = plain(peer)
  if (!set.has(current)) return current
  const hops = (forwardedFor ?? '').split(',').map(plain).filter(Boolean)
  for (let i = hops.length - 1; i >= 0; i--) {
    current = hops[i]
    if (!set.has(current)) return current
  }
  return current
}

/** The caller's address for the audit trail and the throttles (docs/security.md, "Client address"). */
export function clientAddress(req: Request): string | null {
  const stamped = (globalThis as Record<symbol, unknown>)[PEER_STAMP] === true
  const peer = stamped ? req.headers.get(PEER_HEADER) : null
  return resolveClientAddress(peer || null, req.headers.get('x-forwarded-for'), env().trustedProxies)
}

import 'server-only'
import { decode, type JWT } from 'next-auth/jwt'
import { getSessionUser, type PublicUser } from '@/db/queries/users'
import { Lru } from '@/db/lru'
import { env } from '../config/env'

/** next-auth's session cookie names: plain over http, __Secure- over https. */
export const SESSION_COOKIES = ['__Secure-next-auth.session-token', 'next-auth.session-token'] as const

/** How long a sign-in lasts without activity, seconds. */
export const SESSION_MAX_AGE_S = 12 * 60 * 60

export type SessionUser = Pick<PublicUser, 'id' | 'email' | 'name' | 'role'>

function readCookie(header: string | null, name: string): string | undefined {
  if (!header) return undefined
  for (const part of header.split(';')) {
    const i = part.indexOf('=')
    if (i > 0 && part.slice(0, i).trim() === name) return decodeURIComponent(part.slice(i + 1).trim())
  }
  return undefined
}

/**
 * The user a decoded session token still stands for, or null. Checked on every request, so a
 * disabled account, a changed role, a sign-out (`sid` revoked) or a password change or reset (`sv`
 * raised) takes effect at once, not when the token expires.
 */
export async function userForToken(jwt: JWT | null): Promise<SessionUser | null> {
  const id = Number(jwt?.sub)
  if (!jwt || !Number.isInteger(id) || typeof jwt.sid !== 'string' || typeof jwt.sv !== 'number') return null
  const row = await getSessionUser(id, jwt.sid)
  if (!row || row.disabled || row.revoked || row.sessionVersion !== jwt.sv) return null
  return { id: row.id, email: row.email, name: row.name, role: row.role }
}

/**
 * Decrypting a session token costs a key derivation and an AES-GCM open (~0.3 ms), the largest
 * share of a small API read. The same token string always decrypts to the same claims, so the
 * claims are kept by token (the exact string only the secret could have produced) and the expiry is
 * checked again on every use, with next-auth's own 15 s clock tolerance. What can change — a
 * revoked session, a disabled user, a raised session version — is still read by userForToken on
 * each request. Bounded: about this many signed-in browsers per server at once.
 */
const DECODED_TOKENS = 1000
const EXP_TOLERANCE_S = 15
const decoded = new Lru<string, JWT>(DECODED_TOKENS)

async function decodeToken(token: string): Promise<JWT | null> {
  const hit = decoded.get(token)
  if (hit) return typeof hit.exp === 'number' && hit.exp + EXP_TOLERANCE_S > Date.now() / 1000 ? hit : null
  const jwt = await decode({ token, secret: env().authSecret }).catch(() => null)
  if (jwt && typeof jwt.exp === 'number') decoded.set(token, jwt)
  return jwt
}

/** The signed-in user behind a Cookie header, or null. */
export async function userFromCookieHeader(cookieHeader: string | null): Promise<SessionUser | null> {
  for (const name of SESSION_COOKIES) {
    const token = readCookie(cookieHeader, name)
    if (!token) continue
    const jwt = await decodeToken(token)
    if (jwt) return userForToken(jwt)
  }
  return null
}

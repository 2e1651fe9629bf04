import 'server-only'
import NextAuth from 'next-auth'
import type { NextApiRequest, NextApiResponse } from 'next'
import { errorResponse, ValidationError } from '../http/errors'
import { readBodyText } from '../http/request'
import { clientAddress } from '../http/client-address'
import { noStore } from '../http/access'
import { authOptions } from './auth-options'

/** Sign-in and sign-out forms are a few hundred bytes; nothing larger is read. */
const AUTH_BODY_LIMIT = 64 * 1024

function parseCookies(header: string | null): Record<string, string> {
  const out: Record<string, string> = {}
  for (const part of (header ?? '').split(';')) {
    const i = part.indexOf('=')
    if (i > 0) out[part.slice(0, i).trim()] = decodeURIComponent(part.slice(i + 1).trim())
  }
  return out
}

async function parseBody(req: Request): Promise<Record<string, unknown> | undefined> {
  if (req.method !== 'POST') return undefined
  const text = await readBodyText(req, AUTH_BODY_LIMIT)
  const type = req.headers.get('content-type') ?? ''
  if (type.includes('application/json')) {
    try {
      return JSON.parse(text || '{}')
    } catch {
      throw new ValidationError('The request body must be valid JSON')
    }
  }
  if (type.includes('application/x-www-form-urlencoded')) return Object.fromEntries(new URLSearchParams(text))
  return undefined
}

/**
 * next-auth's own endpoints (sign-in, sign-out, CSRF token, session), driven from the Request itself
 * rather than Next's request-scoped headers(), so the body is size-capped before it is read, the
 * sign-in throttle sees the address this app trusts, and tests can call it like any route handler.
 */
export async function handleAuthRequest(req: Request, segments: string[]): Promise<Response> {
  let body: Record<string, unknown> | undefined
  try {
    body = await parseBody(req)
  } catch (e) {
    return noStore(errorResponse(e))
  }
  const url = new URL(req.url)
  const apiReq = {
    method: req.method,
    headers: Object.fromEntries(req.headers),
    cookies: parseCookies(req.headers.get('cookie')),
    query: { ...Object.fromEntries(url.searchParams), nextauth: segments },
    body,
  } as unknown as NextApiRequest
  let status = 200
  let sent: unknown = undefined
  const headers = new Headers()
  const apiRes = {
    status(code: number) {
      status = code
      return apiRes
    },
    getHeader: (k: string) => (k.toLowerCase() === 'set-cookie' ? headers.getSetCookie() : (headers.get(k) ?? undefined)),
    setHeader(k: string, v: string | string[]) {
      if (k.toLowerCase() === 'set-cookie') {
        headers.delete('set-cookie')
        for (const c of [v].flat()) headers.append('set-cookie', c)
      } else headers.set(k, String(v))
      return apiRes
    },
    end: () => undefined,
    json(v: unknown) {
      headers.set('content-type', 'application/json')
      sent = JSON.stringify(v)
    },
    send(v: unknown) {
      sent = typeof v === 'string' || v === undefined ? v : JSON.stringify(v)
    },
  } as unknown as NextApiResponse
  await NextAuth(apiReq, apiRes, authOptions(clientAddress(req)))
  headers.set('cache-control', 'no-store')
  return new Response(status === 302 ? null : (sent as string | undefined), { status, headers })
}

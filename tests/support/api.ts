// Helpers for integration tests: real users in the test database, real session cookies, real Requests.
import { randomUUID } from 'node:crypto'
import { encode } from 'next-auth/jwt'
import { currentSessionVersion } from '@/db/queries/sessions'
import { env } from '@/app/_lib/config/env'
import { createUser, type PublicUser } from '@/db/queries/users'
import type { Role } from '@/domain/roles'
import { hashPassword } from '@/app/_lib/auth/password'

let seq = 0

export async function makeUser(role: Role, opts: { password?: string; email?: string } = {}): Promise<PublicUser> {
  seq += 1
  return createUser({
    email: opts.email ?? `${role}-${seq}-${Math.random().toString(36).slice(2, 7)}@test.example`,
    name: `${role} ${seq}`,
    role,
    passwordHash: await hashPassword(opts.password ?? 'correct horse battery'),
  })
}

/** The Cookie header a browser would send after signing in as `user`, minted with the app's own secret. */
export async function sessionCookie(user: Pick<PublicUser, 'id' | 'role' | 'email' | 'name'>): Promise<string> {
  // A session of its own (sid) at the account's current session version (sv), as a sign-in makes.
  const sv = await currentSessionVersion(user.id)
  const token = await encode({ token: { sub: String(user.id), role: user.role, email: user.email, name: user.name, sid: randomUUID(), sv }, secret: env().authSecret })
  return `next-auth.session-token=${encodeURIComponent(token)}`
}

type Handler<P> = (req: Request, ctx: { params: Promise<P> }) => Promise<Response>

/** Call a route handler as Next would, with a real Request. */
export async function call<P = Record<string, string>>(
  handler: Handler<P>,
  opts: { method?: string; path?: string; body?: unknown; rawBody?: string | ReadableStream<Uint8Array>; cookie?: string; params?: P; headers?: Record<string, string> } = {},
  // Bodies are loose JSON here: each test asserts the fields it cares about.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
): Promise<{ status: number; body: any }> {
  const headers: Record<string, string> = {}
  if (opts.cookie) headers.cookie = opts.cookie
  // A browser's fetch through the app's api() client sends JSON for every state-changing call.
  if (opts.body !== undefined || opts.rawBody !== undefined || !['GET', 'HEAD', undefined].includes(opts.method)) headers['content-type'] = 'application/json'
  Object.assign(headers, opts.headers)
  const body = opts.rawBody ?? (opts.body !== undefined ? JSON.stringify(opts.body) : undefined)
  const req = new Request(`http://127.0.0.1:3000${opts.path ?? '/api/test'}`, {
    method: opts.method ?? 'GET',
    headers,
    body,
    // A streamed body needs half duplex (undici's rule for request streams).
    ...(body instanceof ReadableStream ? { duplex: 'half' } : {}),
  } as RequestInit)
  const res = await handler(req, { params: Promise.resolve((opts.params ?? {}) as P) })
  const text = await res.text()
  return { status: res.status, body: text ? JSON.parse(text) : null }
}

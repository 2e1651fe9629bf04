import { describe, expect, it } from 'vitest'
import * as forgotRoute from '@/app/api/password/forgot/route'
import * as programsRoute from '@/app/api/programs/route'
import { JSON_BODY_LIMIT } from '@/app/_lib/http/request'
import { call, makeUser, sessionCookie } from '@/tests/support/api'

/** A body that makes `total` bytes of JSON-ish text on demand, counting how much the server pulled. */
function lazyBody(total: number, chunk = 64 * 1024) {
  const counter = { pulled: 0 }
  const piece = new TextEncoder().encode('{"email":"' + 'a'.repeat(chunk - 10))
  const stream = new ReadableStream<Uint8Array>({
    pull(c) {
      if (counter.pulled >= total) return c.close()
      counter.pulled += piece.length
      c.enqueue(piece)
    },
  })
  return { stream, counter }
}

describe('request body size', () => {
  it('refuses a declared oversize JSON body with 413 before reading it', async () => {
    const { stream, counter } = lazyBody(20 * 1024 * 1024)
    const res = await call(forgotRoute.POST, { method: 'POST', rawBody: stream, headers: { 'content-length': String(400 * 1024 * 1024) } })
    expect(res.status).toBe(413)
    expect(res.body.error.message).toMatch(/1 MB/)
    expect(counter.pulled).toBeLessThanOrEqual(256 * 1024) // nothing much was read
  })

  it('cuts off an undeclared (streamed) body as soon as it passes the limit', async () => {
    const { stream, counter } = lazyBody(20 * 1024 * 1024)
    const res = await call(forgotRoute.POST, { method: 'POST', rawBody: stream })
    expect(res.status).toBe(413)
    expect(counter.pulled).toBeLessThan(JSON_BODY_LIMIT + 512 * 1024)
  })

  it('applies to signed-in routes too, and a body within the limit still works', async () => {
    const cookie = await sessionCookie(await makeUser('admin'))
    const big = await call(programsRoute.POST, { method: 'POST', cookie, rawBody: JSON.stringify({ name: 'x', description: 'y'.repeat(JSON_BODY_LIMIT) }) })
    expect(big.status).toBe(413)
    const ok = await call(forgotRoute.POST, { method: 'POST', body: { email: 'nobody@test.example' } })
    expect(ok.status).toBe(200)
  })
})

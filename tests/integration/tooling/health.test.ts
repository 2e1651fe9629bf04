import { describe, expect, it } from 'vitest'
import * as healthRoute from '@/app/api/health/route'
import { call } from '@/tests/support/api'

describe('health route', () => {
  it('answers 200 to anyone when the database and the object store answer, and is never cached', async () => {
    const res = await healthRoute.GET(new Request('http://127.0.0.1:3000/api/health'), { params: Promise.resolve({}) })
    expect(res.status).toBe(200)
    expect(res.headers.get('cache-control')).toBe('no-store')
    expect(await res.json()).toEqual({ status: 'ok', database: 'ok', storage: 'ok' })
    expect((await call(healthRoute.GET)).body.status).toBe('ok')
  })
})

import { describe, expect, it } from 'vitest'
import * as auditRoute from '@/app/api/audit/route'
import * as mapsRoute from '@/app/api/maps/route'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import * as reportsRoute from '@/app/api/reports/route'
import * as programsRoute from '@/app/api/programs/route'
import * as programRoute from '@/app/api/programs/[id]/route'
import * as catchAll from '@/app/api/[...path]/route'
import { demoTipper } from '@/db/demo/programs'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { programAndMap } from '@/tests/support/fixtures'
import { programWithSet, reportBody } from '@/tests/support/report-fixtures'

describe('bad values get a 400 that says what is wrong', () => {
  it('out-of-range dates in audit filters and report dates', async () => {
    const admin = await sessionCookie(await makeUser('admin'))
    for (const since of ['0000-01-01', '275760-09-13', '-271821-04-20', '+275760-09-13T00:00:00Z', 'yesterday']) {
      const res = await call(auditRoute.GET, { cookie: admin, path: `/api/audit?since=${encodeURIComponent(since)}` })
      expect(`${since} → ${res.status}`).toBe(`${since} → 400`)
      expect(res.body.error.message).toMatch(/since.*date/i)
    }
    const ok = await call(auditRoute.GET, { cookie: admin, path: '/api/audit?since=2024-01-01&until=2030-01-01T12:00:00Z' })
    expect(ok.status).toBe(200)
    const { setId } = await programWithSet()
    const driver = await sessionCookie(await makeUser('test_driver'))
    for (const drivenOn of ['0000-01-01', '275760-09-13']) {
      const res = await call(reportsRoute.POST, { method: 'POST', cookie: driver, body: reportBody(setId, { drivenOn }) })
      expect(`${drivenOn} → ${res.status}`).toBe(`${drivenOn} → 400`)
    }
  })

  it('refuses unknown and malformed filter values instead of ignoring them', async () => {
    const cookie = await sessionCookie(await makeUser('lead_engineer'))
    const abc = await call(mapsRoute.GET, { cookie, path: '/api/maps?programId=abc' })
    expect(abc.status).toBe(400)
    expect(abc.body.error.message).toMatch(/programId/)
    expect((await call(reportsRoute.GET, { cookie, path: '/api/reports?mapId=1e3' })).status).toBe(400)
    expect((await call(auditRoute.GET, { cookie, path: '/api/audit?actor=3' })).status).toBe(400)
    expect((await call(auditRoute.GET, { cookie, path: '/api/audit?format=xml' })).status).toBe(400)
  })

  it('limit=1.5 gets a message about limits', async () => {
    const { cookie, mapId } = await programAndMap()
    const res = await call(revisionsRoute.GET, { cookie, params: { id: String(mapId) }, path: `/api/maps/${mapId}/revisions?limit=1.5` })
    expect(res.status).toBe(400)
    expect(res.body.error.message).toMatch(/limit must be a whole number from 1 to 500/)
    const audit = await call(auditRoute.GET, { cookie: await sessionCookie(await makeUser('admin')), path: '/api/audit?limit=1.5' })
    expect(audit.body.error.message).toMatch(/limit must be a whole number from 1 to 10000/)
  })

  it('a lone surrogate is refused the same way in every text field, naming the field', async () => {
    const cookie = await sessionCookie(await makeUser('admin'))
    const raw = (name: string, description: string) => `{"name":"${name}","description":"${description}","params":${JSON.stringify(demoTipper)}}`
    const a = await call(programsRoute.POST, { method: 'POST', cookie, rawBody: raw('Lone \\ud800 high', '') })
    const b = await call(programsRoute.POST, { method: 'POST', cookie, rawBody: raw('Fine', 'lone \\udc00 low') })
    for (const [res, field] of [[a, 'name'], [b, 'description']] as const) {
      expect(res.status).toBe(400)
      expect(res.body.error.message).toBe(`${field}: text must be valid Unicode (it holds a lone surrogate)`)
    }
    const created = await call(programsRoute.POST, { method: 'POST', cookie, body: { name: 'Pair 😀', description: '', params: demoTipper } })
    expect(created.status).toBe(201)
    const put = await call(programRoute.PUT, { method: 'PUT', cookie, params: { id: String(created.body.program.id) }, rawBody: raw('Fine', 'x\\udfff') })
    expect(put.status).toBe(400)
  })

  it('an unknown /api path answers a JSON 404, and API answers are never cached', async () => {
    for (const method of ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const) {
      const req = new Request('http://127.0.0.1:3000/api/no/such/thing', { method, headers: { 'content-type': 'application/json' } })
      const res = await catchAll[method](req)
      expect(res.status).toBe(404)
      expect(res.headers.get('content-type')).toMatch(/application\/json/)
      expect((await res.json()).error.code).toBe('not_found')
      expect(res.headers.get('cache-control')).toBe('no-store')
    }
    const cookie = await sessionCookie(await makeUser('admin'))
    const req = new Request('http://127.0.0.1:3000/api/programs', { headers: { cookie } })
    expect((await programsRoute.GET(req, { params: Promise.resolve({}) })).headers.get('cache-control')).toBe('no-store')
    const anon = await programsRoute.GET(new Request('http://127.0.0.1:3000/api/programs'), { params: Promise.resolve({}) })
    expect(anon.headers.get('cache-control')).toBe('no-store')
  })
})

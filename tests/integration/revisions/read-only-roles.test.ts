import { describe, expect, it } from 'vitest'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import * as importRoute from '@/app/api/maps/[id]/import/route'
import * as mapsRoute from '@/app/api/maps/route'
import * as revisionRoute from '@/app/api/maps/[id]/revisions/[number]/route'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { programAndMap, SMALL_DRIVE } from '@/tests/support/fixtures'

describe('who may save', () => {
  for (const role of ['test_driver', 'admin'] as const) {
    it(`a ${role} may read but not save, import or create maps (403), and nothing changes`, async () => {
      const { mapId, programId } = await programAndMap()
      const cookie = await sessionCookie(await makeUser(role))
      expect((await call(revisionRoute.GET, { cookie, params: { id: String(mapId), number: 'latest' } })).status).toBe(200)
      const save = await call(revisionsRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: 1, message: 'x', table: SMALL_DRIVE } })
      expect(save.status).toBe(403)
      const imp = await call(importRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: 1, message: 'x', csv: 'a' } })
      expect(imp.status).toBe(403)
      const create = await call(mapsRoute.POST, { method: 'POST', cookie, body: { programId, name: 'New', kind: 'drive', table: SMALL_DRIVE } })
      expect(create.status).toBe(403)
      expect((await call(revisionsRoute.GET, { cookie, params: { id: String(mapId) } })).body.total).toBe(1)
    })
  }

  it('anonymous callers get 401', async () => {
    const { mapId } = await programAndMap()
    expect((await call(revisionRoute.GET, { params: { id: String(mapId), number: '1' } })).status).toBe(401)
    expect((await call(revisionsRoute.POST, { method: 'POST', params: { id: String(mapId) }, body: {} })).status).toBe(401)
  })
})

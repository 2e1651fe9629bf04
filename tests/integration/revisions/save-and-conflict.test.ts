import { describe, expect, it } from 'vitest'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import * as revisionRoute from '@/app/api/maps/[id]/revisions/[number]/route'
import * as mapRoute from '@/app/api/maps/[id]/route'
import { checksum } from '@/db/checksum'
import { listAudit } from '@/db/queries/audit'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { programAndMap, SMALL_DRIVE, withCell } from '@/tests/support/fixtures'

describe('saving revisions', () => {
  it('stores a new immutable revision with the next number, parent, author, message, notes and checksum', async () => {
    const { cookie, mapId, engineer } = await programAndMap()
    const table = withCell(SMALL_DRIVE, 1, 1, 720)
    const res = await call(revisionsRoute.POST, {
      method: 'POST', cookie, params: { id: String(mapId) },
      body: { parentNumber: 1, message: 'Raise mid pedal at 20 km/h', notes: '**why:** drivers asked', table },
    })
    expect(res.status).toBe(201)
    expect(res.body.revision.number).toBe(2)
    expect(res.body.revision.checksum).toBe(checksum(table))
    const got = await call(revisionRoute.GET, { cookie, params: { id: String(mapId), number: '2' } })
    expect(got.body.revision).toMatchObject({ number: 2, authorId: engineer.id, message: 'Raise mid pedal at 20 km/h', notes: '**why:** drivers asked' })
    expect(got.body.revision.table).toEqual(table)
    const first = await call(revisionRoute.GET, { cookie, params: { id: String(mapId), number: '1' } })
    expect(got.body.revision.parentId).toBe(first.body.revision.id)
    expect(first.body.revision.table).toEqual(SMALL_DRIVE) // the older revision is untouched
    const audit = await listAudit({ entityType: 'map', entityId: mapId })
    expect(audit.map((a) => a.action)).toContain('revision.save')
  })

  it('refuses a save whose parent is no longer the latest with 409 naming the newer revision, and stores nothing', async () => {
    const { cookie, mapId } = await programAndMap()
    const other = await sessionCookie(await makeUser('lead_engineer'))
    const first = await call(revisionsRoute.POST, { method: 'POST', cookie: other, params: { id: String(mapId) }, body: { parentNumber: 1, message: 'Lead edit', table: withCell(SMALL_DRIVE, 2, 2, 900) } })
    expect(first.status).toBe(201)
    const stale = await call(revisionsRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: 1, message: 'My edit', table: withCell(SMALL_DRIVE, 0, 0, 50) } })
    expect(stale.status).toBe(409)
    expect(stale.body.error.code).toBe('conflict')
    expect(stale.body.error.details).toEqual({ latestNumber: 2, parentNumber: 1 })
    expect(stale.body.error.message).toMatch(/Revision 2/)
    const history = await call(revisionsRoute.GET, { cookie, params: { id: String(mapId) } })
    expect(history.body.total).toBe(2)
    expect(history.body.revisions.map((r: { message: string }) => r.message)).toEqual(['Lead edit', 'First cut'])
  })

  it('requires a message and a well-formed table, naming the field; nothing is stored', async () => {
    const { cookie, mapId } = await programAndMap()
    const noMessage = await call(revisionsRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: 1, message: '  ', table: SMALL_DRIVE } })
    expect(noMessage.status).toBe(400)
    expect(noMessage.body.error.message).toMatch(/^message: A message saying why is required/)
    const ragged = { ...SMALL_DRIVE, values: [[1, 2, 3], [4, 5], [6, 7, 8]] }
    const bad = await call(revisionsRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: 1, message: 'x', table: ragged } })
    expect(bad.status).toBe(400)
    expect(bad.body.error.details.issues[0].path).toBe('table.values.1')
    const wrongKind = await call(revisionsRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: 1, message: 'x', table: { ...SMALL_DRIVE, kind: 'regen' } } })
    expect(wrongKind.status).toBe(400)
    expect((await call(revisionsRoute.GET, { cookie, params: { id: String(mapId) } })).body.total).toBe(1)
  })

  it('stores a map that breaks a vehicle rule (so it can be fixed) and reports the finding', async () => {
    const { cookie, mapId } = await programAndMap()
    const over = withCell(SMALL_DRIVE, 2, 0, 99_000)
    const res = await call(revisionsRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: 1, message: 'Too much', table: over } })
    expect(res.status).toBe(201)
    expect(res.body.findings.some((f: { rule: string; severity: string }) => f.rule === 'motor-envelope' && f.severity === 'error')).toBe(true)
    const map = await call(mapRoute.GET, { cookie, params: { id: String(mapId) } })
    expect(map.body.latest.number).toBe(2)
    expect(map.body.findings.length).toBeGreaterThan(0)
  })

  it('gives 404 for a missing map or revision', async () => {
    const { cookie, mapId } = await programAndMap()
    expect((await call(mapRoute.GET, { cookie, params: { id: '987654' } })).status).toBe(404)
    expect((await call(revisionRoute.GET, { cookie, params: { id: String(mapId), number: '77' } })).status).toBe(404)
  })
})

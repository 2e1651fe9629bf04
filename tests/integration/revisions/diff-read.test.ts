import { describe, expect, it } from 'vitest'
import * as importRoute from '@/app/api/maps/[id]/import/route'
import * as diffRoute from '@/app/api/maps/[id]/diff/route'
import { toCsv } from '@/maps'
import { call } from '@/tests/support/api'
import { programAndMap, SMALL_DRIVE, withCell } from '@/tests/support/fixtures'

// The diff read takes two revisions of one map in one query (loadRevisionPair); every other case,
// and every miss, must answer exactly as reading each side on its own did.
async function mapWithTwoRevisions() {
  const m = await programAndMap()
  const r = await call(importRoute.POST, { method: 'POST', cookie: m.cookie, params: { id: String(m.mapId) }, body: { parentNumber: 1, message: 'one cell', csv: toCsv(withCell(SMALL_DRIVE, 1, 2, 700)) } })
  expect(r.status).toBe(201)
  return m
}

const diffOf = (cookie: string, id: number | string, query: string) =>
  call(diffRoute.GET, { path: `/api/maps/${id}/diff?${query}`, cookie, params: { id: String(id) } })

describe('GET /api/maps/:id/diff', () => {
  it('diffs two revisions of one map, either way round, and a revision with itself', async () => {
    const { cookie, mapId } = await mapWithTwoRevisions()
    const fwd = await diffOf(cookie, mapId, 'a=1&b=2')
    expect(fwd.status).toBe(200)
    expect(fwd.body.a).toEqual({ mapId, number: 1 })
    expect(fwd.body.b).toEqual({ mapId, number: 2 })
    expect(fwd.body.diff.changed).toHaveLength(1)
    const back = await diffOf(cookie, mapId, 'a=2&b=1')
    expect(back.body.diff.changed.map((c: { delta: number }) => c.delta)).toEqual(fwd.body.diff.changed.map((c: { delta: number }) => -c.delta))
    const same = await diffOf(cookie, mapId, 'a=2&b=2')
    expect(same.status).toBe(200)
    expect(same.body.diff.changed).toEqual([])
    // 'latest' and a bMap naming the same map take the per-side path and agree.
    expect((await diffOf(cookie, mapId, 'a=1&b=latest')).body.diff).toEqual(fwd.body.diff)
    expect((await diffOf(cookie, mapId, `a=1&b=2&bMap=${mapId}`)).body.diff).toEqual(fwd.body.diff)
  })

  it('diffs across two maps', async () => {
    const one = await mapWithTwoRevisions()
    const other = await programAndMap()
    const res = await diffOf(one.cookie, one.mapId, `a=2&b=1&bMap=${other.mapId}`)
    expect(res.status).toBe(200)
    expect(res.body.b).toEqual({ mapId: other.mapId, number: 1 })
    expect(res.body.diff.changed).toHaveLength(1)
  })

  it('names the missing side, A first when both are missing, and names a malformed number', async () => {
    const { cookie, mapId } = await mapWithTwoRevisions()
    const noB = await diffOf(cookie, mapId, 'a=1&b=9')
    expect(noB.status).toBe(404)
    expect(JSON.stringify(noB.body)).toContain(`Revision 9 of map ${mapId}`)
    const noA = await diffOf(cookie, mapId, 'a=8&b=1')
    expect(noA.status).toBe(404)
    expect(JSON.stringify(noA.body)).toContain(`Revision 8 of map ${mapId}`)
    const neither = await diffOf(cookie, mapId, 'a=8&b=9')
    expect(JSON.stringify(neither.body)).toContain(`Revision 8 of map ${mapId}`)
    const noMap = await diffOf(cookie, 999999, 'a=1&b=2')
    expect(noMap.status).toBe(404)
    expect(JSON.stringify(noMap.body)).toContain('Map 999999')
    const bad = await diffOf(cookie, mapId, 'a=1&b=two')
    expect(bad.status).toBe(404) // a malformed id names nothing (MalformedIdError)
    expect(bad.body.error.message).toContain('Revision number "two" names nothing')
  })
})

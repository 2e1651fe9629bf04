import { describe, expect, it } from 'vitest'
import * as importRoute from '@/app/api/maps/[id]/import/route'
import * as exportRoute from '@/app/api/maps/[id]/revisions/[number]/export/route'
import * as revisionRoute from '@/app/api/maps/[id]/revisions/[number]/route'
import * as diffRoute from '@/app/api/maps/[id]/diff/route'
import { fromCsv, fromJson, toCsv } from '@/maps'
import { call } from '@/tests/support/api'
import { programAndMap, SMALL_DRIVE, withCell } from '@/tests/support/fixtures'

async function download(cookie: string, mapId: number, number: string, format: string) {
  const req = new Request(`http://127.0.0.1/api/maps/${mapId}/revisions/${number}/export?format=${format}`, { headers: { cookie } })
  return exportRoute.GET(req, { params: Promise.resolve({ id: String(mapId), number }) })
}

describe('import and export', () => {
  it('imports a CSV as a new revision and exports it back identically as CSV and JSON', async () => {
    const { cookie, mapId } = await programAndMap()
    const edited = withCell(SMALL_DRIVE, 1, 2, 450.5)
    const res = await call(importRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: 1, message: 'From the bench spreadsheet', csv: toCsv(edited) } })
    expect(res.status).toBe(201)
    expect(res.body.revision.number).toBe(2)
    const csv = await download(cookie, mapId, '2', 'csv')
    expect(csv.headers.get('content-type')).toMatch(/text\/csv/)
    expect(csv.headers.get('content-disposition')).toMatch(/attachment; filename=".*-r2\.csv"/)
    expect(fromCsv(await csv.text(), 'drive')).toEqual(edited)
    const json = await download(cookie, mapId, '2', 'json')
    expect(fromJson(await json.text())).toEqual(edited)
  })

  it('refuses a malformed CSV with 400 naming the line and column, and stores nothing', async () => {
    const { cookie, mapId } = await programAndMap()
    const bad = 'pedal_pct\\speed_kmh,0,20,60\n0,100,0,0\n50,800,abc,400\n100,1600,1500,800\n'
    const res = await call(importRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: 1, message: 'bad', csv: bad } })
    expect(res.status).toBe(400)
    expect(res.body.error.details).toMatchObject({ line: 3, column: 3 })
    expect(res.body.error.message).toMatch(/line 3, column 3/)
    const latest = await call(revisionRoute.GET, { cookie, params: { id: String(mapId), number: 'latest' } })
    expect(latest.body.revision.number).toBe(1)
  })

  it('exports a C header with the revision number, CRC and caution, and refuses an unknown format', async () => {
    const { cookie, mapId } = await programAndMap()
    const h = await download(cookie, mapId, '1', 'c')
    expect(h.status).toBe(200)
    const text = await h.text()
    expect(text).toMatch(/#ifndef/)
    expect(text).toMatch(/closed course/)
    expect(text).toMatch(/REVISION\s+1u?\b/)
    expect((await download(cookie, mapId, '1', 'xlsx')).status).toBe(400)
  })

  it('diffs two revisions cell by cell, largest change first', async () => {
    const { cookie, mapId } = await programAndMap()
    await call(importRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: 1, message: 'two cells', csv: toCsv(withCell(withCell(SMALL_DRIVE, 0, 0, 90), 2, 1, 1300)) } })
    const req = new Request(`http://127.0.0.1/api/maps/${mapId}/diff?a=1&b=2`, { headers: { cookie } })
    const res = await diffRoute.GET(req, { params: Promise.resolve({ id: String(mapId) }) })
    const body = await res.json()
    expect(body.diff.changed.map((c: { row: number; col: number; delta: number }) => [c.row, c.col, c.delta])).toEqual([[2, 1, -200], [0, 0, -10]])
  })
})

import { describe, expect, it } from 'vitest'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import { countRevisions, listRevisions, refreshRevisionStatistics } from '@/db/queries/revisions'
import { call } from '@/tests/support/api'
import { programAndMap, SMALL_DRIVE, withCell } from '@/tests/support/fixtures'

describe('history queries', () => {
  it('count the revisions by the contiguous numbers and page the history newest first', async () => {
    const { cookie, mapId } = await programAndMap()
    for (let n = 1; n < 5; n++)
      await call(revisionsRoute.POST, { method: 'POST', cookie, params: { id: String(mapId) }, body: { parentNumber: n, message: `r${n + 1}`, table: withCell(SMALL_DRIVE, 0, 0, n) } })
    expect(await countRevisions(mapId)).toBe(5)
    expect((await listRevisions(mapId, { limit: 2 })).map((r) => r.number)).toEqual([5, 4])
    expect((await listRevisions(mapId, { limit: 2, before: 4 })).map((r) => r.number)).toEqual([3, 2])
    await expect(refreshRevisionStatistics()).resolves.toBeUndefined() // the same statement works on PGlite and PostgreSQL
  })
})

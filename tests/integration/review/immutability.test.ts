import { describe, expect, it } from 'vitest'
import { sql } from 'drizzle-orm'
import { getDb } from '@/db/client'
import { getRevision } from '@/db/queries/revisions'
import { programAndMap, SMALL_DRIVE } from '@/tests/support/fixtures'

// Runs on PGlite and, in the second pass, on PostgreSQL: the trigger comes from the migrations.
describe('revisions are immutable in the database', () => {
  it('refuses a raw UPDATE of the values, axes or checksum, in any state', async () => {
    const { mapId } = await programAndMap()
    const db = await getDb()
    const changed = { ...SMALL_DRIVE, values: SMALL_DRIVE.values.map((r) => r.map((v) => v + 1)) }
    await expect(db.execute(sql`update map_revisions set "table" = ${JSON.stringify(changed)}::jsonb where map_id = ${mapId}`)).rejects.toThrow()
    await expect(db.execute(sql`update map_revisions set checksum = 'forged' where map_id = ${mapId}`)).rejects.toThrow()
    await db.execute(sql`update map_revisions set state = 'in_review' where map_id = ${mapId}`)
    await expect(db.execute(sql`update map_revisions set "table" = jsonb_set("table", '{values,0,0}', '9999') where map_id = ${mapId}`)).rejects.toThrow()
    const rev = await getRevision(mapId, 1)
    expect(rev?.table).toEqual(SMALL_DRIVE)
    expect(rev?.state).toBe('in_review')
  })

  it('refuses to delete a revision that has left the draft state', async () => {
    const { mapId } = await programAndMap()
    const db = await getDb()
    for (const state of ['approved', 'released']) {
      await db.execute(sql`update map_revisions set state = ${state} where map_id = ${mapId}`)
      await expect(db.execute(sql`delete from map_revisions where map_id = ${mapId}`)).rejects.toThrow()
    }
    expect((await getRevision(mapId, 1))?.number).toBe(1)
  })

  it('refuses an unknown state', async () => {
    const { mapId } = await programAndMap()
    const db = await getDb()
    await expect(db.execute(sql`update map_revisions set state = 'shipped' where map_id = ${mapId}`)).rejects.toThrow()
  })
})

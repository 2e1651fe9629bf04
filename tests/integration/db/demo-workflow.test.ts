// The demo's workflow seed (what `npm run demo` and the e2e server load): it must run to the end on the
// demo trucks as they are, leaving a released set per program and the tipper's set under test showing
// the lift-off finding at its battery corners.
import { describe, expect, it } from 'vitest'
import { sql } from 'drizzle-orm'
import { getDb } from '@/db/client'
import { seedDemo } from '@/db/seed'
import { seedWorkflow } from '@/scripts/seed-workflow'
import { getSet, listSets } from '@/db/queries/sets'
import { setGateFor } from '@/app/_lib/sets/service'

describe('demo workflow seed', () => {
  it('releases a set of each program and leaves the tipper’s set under test with the lift-off finding', async () => {
    const db = await getDb()
    await seedDemo(db, async (p) => `test:${p}`)
    expect(await seedWorkflow(db)).toBe(true)
    const sets = await listSets()
    const programs = [...new Set(sets.map((s) => s.programId))]
    for (const p of programs) expect(sets.some((s) => s.programId === p && s.status === 'released'), `program ${p}`).toBe(true)
    const underTest = sets.find((s) => s.programName.includes('Tipper') && s.status === 'testing')!
    const gate = await setGateFor((await getSet(underTest.id))!)
    expect(gate.conditions.find((c) => c.id === 'lift-off')?.met).toBe(false)
    const res = await db.execute(sql`select count(*)::int as n from drive_reports`)
    expect((res as unknown as { rows: { n: number }[] }).rows[0].n).toBeGreaterThan(0)
  }, 120_000)
})

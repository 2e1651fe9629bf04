// Start and hold on grade: declared in the program's release conditions, shown on the set's
// drivability result and judged by the set gate; versions that declare nothing judge as before.
import { describe, expect, it } from 'vitest'
import { eq } from 'drizzle-orm'
import * as drivabilityRoute from '@/app/api/sets/[id]/drivability/route'
import * as programRoute from '@/app/api/programs/[id]/route'
import { getDb } from '@/db/client'
import { vehiclePrograms } from '@/db/schema'
import { SMALL_DRIVE } from '@/tests/support/fixtures'
import { GENTLE } from '@/tests/support/review-fixtures'
import { call } from '@/tests/support/api'
import { getSetView, makeSet, setSetup, type SetCtx } from '@/tests/support/set-fixtures'

const drivability = (id: number, cookie: string) =>
  drivabilityRoute.GET(new Request(`http://127.0.0.1/api/sets/${id}/drivability`, { headers: { cookie } }), { params: Promise.resolve({ id: String(id) }) }).then(async (r) => ({ status: r.status, body: await r.json() }))

async function declare(s: SetCtx, grades: Record<string, number>) {
  const db = await getDb()
  const [p] = await db.select().from(vehiclePrograms).where(eq(vehiclePrograms.id, s.programId))
  return call(programRoute.PUT, { method: 'PUT', cookie: s.cookie, params: { id: String(s.programId) }, body: { name: p.name, description: p.description, params: p.params, releaseConditions: { ...p.releaseConditions, ...grades }, reason: 'Quarry access road' } })
}

type Condition = { id: string; met: boolean; summary: string; details: string[] }
const gradeOf = async (id: number, cookie: string) => ((await getSetView(id, cookie)).body.gate.conditions as Condition[]).find((c) => c.id === 'grade')

describe('start and hold on grade', () => {
  it('a strong map passes the declared grades; a gentle one is short, on the page and in the gate; an older set has no such condition', async () => {
    // Demo tipper laden (26 t, R = 0.52 m, G = 10.304, η = 0.93, C_rr = 0.007): 10 % needs
    // 254,973 N × (0.09950 + 0.007 × 0.99504) = 27,144 N → 27,144 × 0.52 / (10.304 × 0.93) ≈ 1,473 N·m (hand, see
    // tests/unit/physics/gradeability.test.ts for the formula's source). SMALL_DRIVE gives 1,600 N·m at full pedal, GENTLE 120.
    const strong = await setSetup({ drive: SMALL_DRIVE })
    const before = await makeSet(strong)
    expect(await gradeOf(before, strong.cookie)).toBeUndefined()
    expect((await declare(strong, { startGradePct: 10, holdGradePct: 3, holdSpeedKmh: 60 })).status).toBe(200)
    const after = await makeSet(strong)
    const d = await drivability(after, strong.cookie)
    expect(d.status, JSON.stringify(d.body)).toBe(200)
    expect(d.body.grade.map((k: { kind: string; verdict: string }) => [k.kind, k.verdict])).toEqual([['start', 'met'], ['hold', 'met']])
    expect(d.body.grade[0].neededNm).toBeCloseTo(1473, -1)
    expect(d.body.mapSpeedSource).toBe('road')
    const met = await gradeOf(after, strong.cookie)
    expect(met?.met).toBe(true)
    expect(met?.details).toHaveLength(2)
    expect(await gradeOf(before, strong.cookie)).toBeUndefined() // the older set keeps its version

    const weak = await setSetup({ drive: GENTLE })
    expect((await declare(weak, { startGradePct: 10 })).status).toBe(200)
    const set = await makeSet(weak)
    const short = await gradeOf(set, weak.cookie)
    expect(short?.met).toBe(false)
    expect(short?.summary).toMatch(/1 of 1 grade requirement\(s\) not met/)
    expect(short?.details[0]).toMatch(/Raise the full-pedal cells/)
  })

  it('refuses a hold grade without its speed, naming the missing field', async () => {
    const s = await setSetup()
    const r = await declare(s, { holdGradePct: 4 })
    expect(r.status).toBe(400)
    expect(r.body.error.message).toMatch(/speed to hold/)
  })
})

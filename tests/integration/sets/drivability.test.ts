// Drivability of a set through its ramps: the comfort limits of its parameter version judge every
// manoeuvre on every release condition; a slower tip-in ramp turns a jerk failure into a pass.
import { describe, expect, it } from 'vitest'
import * as drivabilityRoute from '@/app/api/sets/[id]/drivability/route'
import * as rampsRoute from '@/app/api/programs/[id]/ramp-versions/route'
import { SMALL_DRIVE } from '@/tests/support/fixtures'
import { call } from '@/tests/support/api'
import { makeSet, setSetup } from '@/tests/support/set-fixtures'

const STRONG = { ...SMALL_DRIVE, values: [[0, 0, 0], [1400, 700, 400], [2800, 1500, 800]] }
const ramps = (tipIn: number) => ({ speedKmh: [0, 100], tipInNmPerS: [tipIn, tipIn], tipOutNmPerS: [3000, 3000], lashBandNm: 20, lashRateNmPerS: 400 })

const drivability = (id: number, cookie: string, query = '') =>
  drivabilityRoute.GET(new Request(`http://127.0.0.1/api/sets/${id}/drivability?${query}`, { headers: { cookie } }), { params: Promise.resolve({ id: String(id) }) }).then(async (r) => ({ status: r.status, body: await r.json() }))

describe('drivability of a set', () => {
  it('a fast tip-in ramp breaks the jerk limit; a slower one passes; the traces of one run come on request', async () => {
    const s = await setSetup({ drive: STRONG })
    const post = (tipIn: number, reason: string) => call(rampsRoute.POST, { method: 'POST', cookie: s.cookie, params: { id: String(s.programId) }, body: { limits: ramps(tipIn), reason } })
    expect((await post(50_000, 'Sharp')).status).toBe(201)
    const sharp = await makeSet(s)
    const a = await drivability(sharp, s.driverCookie, 'tipInSpeedKmh=20&tipInFromPct=0&tipInToPct=100')
    expect(a.status, JSON.stringify(a.body)).toBe(200)
    expect(a.body.comfort.maxPeakJerkMps3).toBe(5)
    expect(a.body.comfort.source).toMatch(/Common practice/)
    const tipIns = a.body.rows.filter((r: { manoeuvre: string }) => r.manoeuvre === 'tip-in')
    expect(tipIns).toHaveLength(4) // 2 surfaces × 2 load cases of the default release conditions
    expect(tipIns.some((r: { fails: string[] }) => r.fails.includes('jerk'))).toBe(true)
    expect(a.body.passed).toBe(false)

    expect((await post(1500, 'Gentle tip-in')).status).toBe(201)
    const gentle = await makeSet(s)
    const b = await drivability(gentle, s.driverCookie, 'tipInSpeedKmh=20&tipInFromPct=0&tipInToPct=100&manoeuvre=tip-in&surface=wet-asphalt&loadCase=laden')
    const tipIns2 = b.body.rows.filter((r: { manoeuvre: string }) => r.manoeuvre === 'tip-in')
    expect(tipIns2.every((r: { fails: string[] }) => !r.fails.includes('jerk'))).toBe(true)
    // Each run's peak jerk fell: the same conditions, a slower ramp.
    tipIns2.forEach((r: { peakJerkMps3: number }, i: number) => expect(r.peakJerkMps3).toBeLessThan(tipIns[i].peakJerkMps3))
    expect(b.body.trace.series.t.length).toBe(b.body.trace.series.jerkMps3.length)
    expect(b.body.trace.pedalAtS).toBe(1)
  })

  it('refuses a bad setting with the field and the range, and a trace of an unknown manoeuvre', async () => {
    const s = await setSetup()
    const id = await makeSet(s)
    const bad = await drivability(id, s.cookie, 'tipInToPct=140')
    expect(bad.status).toBe(400)
    expect(bad.body.error.message).toMatch(/tipInToPct must be at most 100 %/)
    const unknown = await drivability(id, s.cookie, 'manoeuvre=wheelie&surface=ice&loadCase=empty')
    expect(unknown.status).toBe(400)
    expect(unknown.body.error.message).toMatch(/manoeuvre must be one of tip-in, tip-out, launch/)
  })
})

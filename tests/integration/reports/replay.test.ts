// A report's log replayed through a candidate set of the same program, read again from storage.
import { describe, expect, it } from 'vitest'
import * as logsRoute from '@/app/api/reports/[id]/logs/route'
import * as replayRoute from '@/app/api/reports/[id]/replay/route'
import { analyse } from '@/app/_lib/reports/log-jobs'
import { generateLog } from '@/tests/support/log-generator'
import { fileSetReport, makeSet, saveRevision, setSetup } from '@/tests/support/set-fixtures'
import { SMALL_DRIVE } from '@/tests/support/fixtures'

async function upload(reportId: number, cookie: string, body: string) {
  const req = new Request(`http://127.0.0.1/api/reports/${reportId}/logs?name=drive.csv`, { method: 'POST', headers: { cookie, 'content-type': 'text/csv' }, body })
  const res = await logsRoute.POST(req, { params: Promise.resolve({ id: String(reportId) }) })
  return { status: res.status, body: await res.json() }
}
const replay = (reportId: number, cookie: string, query: string) =>
  replayRoute.GET(new Request(`http://127.0.0.1/api/reports/${reportId}/replay?${query}`, { headers: { cookie } }), { params: Promise.resolve({ id: String(reportId) }) }).then(async (r) => ({ status: r.status, body: await r.json() }))

describe('replaying a report’s log through a set', () => {
  it('through the driven set asks for exactly what was driven; through a stronger one, for more, and says where', async () => {
    const s = await setSetup({ drive: SMALL_DRIVE })
    const driven = await makeSet(s)
    const reportId = await fileSetReport(driven, s.driverCookie)
    const early = await replay(reportId, s.cookie, `setId=${driven}`)
    expect(early.status).toBe(409)
    expect(early.body.error.message).toMatch(/no analysed log/)

    const { csv } = generateLog({ seed: 3, durationS: 60, rateHz: 50 })
    const up = await upload(reportId, s.driverCookie, csv)
    expect(up.status).toBe(201)
    await analyse(up.body.log.id)

    const same = await replay(reportId, s.cookie, `setId=${driven}`)
    expect(same.status, JSON.stringify(same.body)).toBe(200)
    expect(same.body.result.samples).toBe(3001) // 60 s at 50 Hz, both ends included
    expect(same.body.result.moreSeconds).toBe(0)
    expect(same.body.result.series.candidateNm).toEqual(same.body.result.series.drivenNm)

    const stronger = { ...SMALL_DRIVE, values: SMALL_DRIVE.values.map((row) => row.map((v) => v * 1.5 + 50)) }
    const rev2 = await saveRevision(s, s.mapId, 1, stronger)
    const candidate = await makeSet(s, { driveRevisionId: rev2 })
    const more = await replay(reportId, s.leadCookie, `setId=${candidate}&logId=${up.body.log.id}`)
    expect(more.status).toBe(200)
    expect(more.body.candidate.id).toBe(candidate)
    expect(more.body.result.moreSeconds).toBeGreaterThan(0)
    expect(more.body.result.worstCells.length).toBeGreaterThan(0)
    expect(more.body.result.worstExcessNm).toBeGreaterThan(25)
    // Same log, same driven requests: only the candidate's side differs.
    expect(more.body.result.series.drivenNm).toEqual(same.body.result.series.drivenNm)
  })

  it('refuses a set of another program and a log of another report, saying which', async () => {
    const a = await setSetup()
    const b = await setSetup()
    const setA = await makeSet(a)
    const setB = await makeSet(b)
    const reportId = await fileSetReport(setA, a.driverCookie)
    const other = await replay(reportId, a.cookie, `setId=${setB}`)
    expect(other.status).toBe(400)
    expect(other.body.error.message).toMatch(/a drive replays through a set of its own program/)
    const missing = await replay(reportId, a.cookie, `setId=${setA}&logId=999999`)
    expect(missing.status).toBe(404)
    expect((await replay(reportId, a.cookie, 'setId=abc')).status).toBe(400)
  })
})

describe('the gate’s evidence replay, when the parameter version declares a margin', () => {
  it('refuses a set that would ask for more than was driven beyond the margin; the same maps under the new version pass', async () => {
    const programRoute = await import('@/app/api/programs/[id]/route')
    const { call } = await import('@/tests/support/api')
    const { getSetView, gateMet } = await import('@/tests/support/set-fixtures')
    const s = await setSetup({ drive: SMALL_DRIVE })
    const driven = await makeSet(s)
    const reportId = await fileSetReport(driven, s.driverCookie)
    const up = await upload(reportId, s.driverCookie, generateLog({ seed: 5, durationS: 30, rateHz: 50 }).csv)
    await analyse(up.body.log.id)
    // Without a declared margin there is no replay condition.
    expect(gateMet(await getSetView(driven, s.leadCookie)).replay).toBeUndefined()

    const { program } = (await call(programRoute.GET, { cookie: s.cookie, params: { id: String(s.programId) } })).body
    const put = await call(programRoute.PUT, { method: 'PUT', cookie: s.cookie, params: { id: String(s.programId) }, body: { name: program.name, description: '', params: program.params, releaseConditions: { ...program.releaseConditions, replayMarginNm: 50 }, reason: 'Judge new sets against the evidence' } })
    expect(put.status, JSON.stringify(put.body)).toBe(200)

    const rev2 = await saveRevision(s, s.mapId, 1, { ...SMALL_DRIVE, values: SMALL_DRIVE.values.map((row) => row.map((v) => v * 1.5 + 80)) })
    const stronger = await makeSet(s, { driveRevisionId: rev2 })
    const view = await getSetView(stronger, s.leadCookie)
    const replay = view.body.gate.conditions.find((c: { id: string }) => c.id === 'replay')
    expect(replay.met).toBe(false)
    expect(replay.details[0]).toMatch(new RegExp(`report ${reportId}, set \\d+\\): up to \\d+ N·m more`))

    const sameMaps = await makeSet(s) // the driven revisions, judged with version 2
    expect(sameMaps).not.toBe(driven)
    const same = (await getSetView(sameMaps, s.leadCookie)).body.gate.conditions.find((c: { id: string }) => c.id === 'replay')
    expect(same.met, JSON.stringify(same)).toBe(true)
    expect(same.summary).toMatch(/Replayed over 1 evidence log/)
  })
})

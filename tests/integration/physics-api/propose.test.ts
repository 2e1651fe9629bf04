import { beforeAll, describe, expect, it } from 'vitest'
import * as proposeRoute from '@/app/api/maps/[id]/revisions/[number]/propose/route'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import { tractionLimitTorqueBySpeed } from '@/physics'
import { demoTipper } from '@/db/demo/programs'
import { getRevision } from '@/db/queries/revisions'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { tipperWithMaps } from './fixtures'

let ctx: Awaited<ReturnType<typeof tipperWithMaps>>
let calib: string

beforeAll(async () => {
  ctx = await tipperWithMaps()
  calib = await sessionCookie(ctx.author)
})

const propose = (cookie: string | undefined, body: unknown, number = '1') =>
  call(proposeRoute.POST, { method: 'POST', cookie, body, params: { id: ctx.driveId, number } })

describe('POST /api/maps/:id/revisions/:number/propose', () => {
  it('answers 401 without a session and 403 to a test driver', async () => {
    expect((await propose(undefined, { loadCase: 'empty', surface: 'ice' })).status).toBe(401)
    const driver = await sessionCookie(await makeUser('test_driver'))
    expect((await propose(driver, { loadCase: 'empty', surface: 'ice' })).status).toBe(403)
  })

  it('answers 400 for bad JSON, a missing surface or a margin out of range', async () => {
    const raw = await call(proposeRoute.POST, { method: 'POST', cookie: calib, rawBody: '{', params: { id: ctx.driveId, number: '1' } })
    expect(raw.status).toBe(400)
    expect((await propose(calib, { loadCase: 'empty' })).status).toBe(400)
    const margin = await propose(calib, { loadCase: 'empty', surface: 'ice', marginPct: 80 })
    expect(margin.body.error.message).toBe('marginPct: marginPct must be at most 50 %')
  })

  it('returns a draft under the limit less the default 10 % margin without saving it, and the draft saves as a new revision', async () => {
    const res = await propose(calib, { loadCase: 'empty', surface: 'gravel' })
    expect(res.status).toBe(200)
    expect(res.body.marginPct).toBe(10)
    expect(res.body.baseNumber).toBe(1)
    expect(res.body.latestNumber).toBe(1)
    expect(res.body.changes.length).toBeGreaterThan(0)
    const limits = tractionLimitTorqueBySpeed({ vehicle: demoTipper, loadCase: 'empty', surface: 'gravel', colAxis: res.body.table.colAxis, kind: 'drive' })
    const before = (await getRevision(Number(ctx.driveId), 1))?.table.values ?? []
    res.body.table.values.forEach((row: number[], r: number) =>
      row.forEach((v, c) => {
        if (before[r][c] > limits[c].tractionLimitNm * 0.9) expect(v).toBeLessThanOrEqual(limits[c].tractionLimitNm * 0.9)
        if (r > 0) expect(v).toBeGreaterThanOrEqual(res.body.table.values[r - 1][c])
      }),
    )
    expect((await getRevision(Number(ctx.driveId)))?.number).toBe(1) // nothing saved

    const saved = await call(revisionsRoute.POST, {
      method: 'POST', cookie: calib, params: { id: ctx.driveId },
      body: { parentNumber: res.body.latestNumber, message: 'Traction-safe draft for empty on gravel', table: res.body.table },
    })
    expect(saved.status).toBe(201)
    expect((await getRevision(Number(ctx.driveId)))?.table.values).toEqual(res.body.table.values)
  })
})

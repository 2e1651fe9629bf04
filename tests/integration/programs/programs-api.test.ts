import { describe, expect, it } from 'vitest'
import * as programsRoute from '@/app/api/programs/route'
import * as programRoute from '@/app/api/programs/[id]/route'
import { demoTipper } from '@/db/demo/programs'
import { getProgram } from '@/db/queries/programs'
import { listAudit } from '@/db/queries/audit'
import { call, makeUser, sessionCookie } from '@/tests/support/api'

const valid = { name: 'Test 6x4', description: 'integration', params: demoTipper }

describe('vehicle programs API', () => {
  it('lets an engineer create a program, anyone signed in read it, and audits the change', async () => {
    const calib = await makeUser('calibration_engineer')
    const created = await call(programsRoute.POST, { method: 'POST', cookie: await sessionCookie(calib), body: valid })
    expect(created.status).toBe(201)
    const id = created.body.program.id
    const driver = await makeUser('test_driver')
    const read = await call(programRoute.GET, { cookie: await sessionCookie(driver), params: { id: String(id) } })
    expect(read.status).toBe(200)
    expect(read.body.program.params).toEqual(demoTipper)
    expect((await listAudit({ entityType: 'vehicle_program', entityId: id }))[0].action).toBe('program.create')
  })

  it('refuses a test driver with 403', async () => {
    const driver = await makeUser('test_driver')
    const res = await call(programsRoute.POST, { method: 'POST', cookie: await sessionCookie(driver), body: { ...valid, name: 'Driver attempt' } })
    expect(res.status).toBe(403)
  })

  it('refuses a negative mass and a CG beyond the wheelbase with messages naming the field, and keeps the saved program', async () => {
    const lead = await makeUser('lead_engineer')
    const cookie = await sessionCookie(lead)
    const created = await call(programsRoute.POST, { method: 'POST', cookie, body: { ...valid, name: 'Keeps its values' } })
    const id = String(created.body.program.id)

    const negative = await call(programRoute.PUT, { method: 'PUT', cookie, params: { id }, body: { ...valid, params: { ...demoTipper, emptyMassKg: -5 } } })
    expect(negative.status).toBe(400)
    expect(negative.body.error.message).toBe('params.emptyMassKg: Empty mass must be greater than 0 kg')

    const highCg = await call(programRoute.PUT, { method: 'PUT', cookie, params: { id }, body: { ...valid, params: { ...demoTipper, ladenCgHeightM: 5 } } })
    expect(highCg.status).toBe(400)
    expect(highCg.body.error.details.issues.map((i: { path: string }) => i.path)).toContain('params.ladenCgHeightM')

    const cgBehind = await call(programRoute.PUT, { method: 'PUT', cookie, params: { id }, body: { ...valid, params: { ...demoTipper, emptyCgToFrontAxleM: 9 } } })
    expect(cgBehind.status).toBe(400)
    expect(cgBehind.body.error.message).toMatch(/between the steer axle and the drive axle/)

    expect((await getProgram(Number(id)))?.params).toEqual(demoTipper)
  })

  it('refuses a duplicate name with 409 and answers 404 for a missing program', async () => {
    const cookie = await sessionCookie(await makeUser('admin'))
    await call(programsRoute.POST, { method: 'POST', cookie, body: { ...valid, name: 'Unique name' } })
    const dupe = await call(programsRoute.POST, { method: 'POST', cookie, body: { ...valid, name: 'UNIQUE NAME' } })
    expect(dupe.status).toBe(409)
    expect((await call(programRoute.GET, { cookie, params: { id: '424242' } })).status).toBe(404)
  })
})

import { describe, expect, it } from 'vitest'
import * as programsRoute from '@/app/api/programs/route'
import * as forgotRoute from '@/app/api/password/forgot/route'
import { listPrograms } from '@/db/queries/programs'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { demoTipper } from '@/db/demo/programs'

const program = (name: string) => JSON.stringify({ name, description: '', params: demoTipper })
const named = async (name: string) => (await listPrograms()).filter((p) => p.name === name).length

// What a page on another origin can make a browser send with the victim's cookie, and what it cannot.
describe('cross-site request forgery', () => {
  it('refuses a text/plain POST (a no-cors request from another page) and saves nothing', async () => {
    const cookie = await sessionCookie(await makeUser('lead_engineer'))
    const res = await call(programsRoute.POST, { method: 'POST', cookie, rawBody: program('Forged A'), headers: { 'content-type': 'text/plain;charset=UTF-8' } })
    expect(res.status).toBe(415)
    expect(res.body.error.message).toMatch(/application\/json/)
    expect(await named('Forged A')).toBe(0)
  })

  it('refuses JSON sent from another port of the same host (Origin / Sec-Fetch-Site)', async () => {
    const cookie = await sessionCookie(await makeUser('lead_engineer'))
    const otherPort = await call(programsRoute.POST, { method: 'POST', cookie, rawBody: program('Forged B'), headers: { origin: 'http://127.0.0.1:4000' } })
    expect(otherPort.status).toBe(403)
    const sameSite = await call(programsRoute.POST, { method: 'POST', cookie, rawBody: program('Forged B'), headers: { 'sec-fetch-site': 'same-site' } })
    expect(sameSite.status).toBe(403)
    expect(await named('Forged B')).toBe(0)
  })

  it("accepts the app's own page (same origin) and callers that send no browser headers", async () => {
    const cookie = await sessionCookie(await makeUser('lead_engineer'))
    const own = await call(programsRoute.POST, { method: 'POST', cookie, rawBody: program('Own page'), headers: { origin: 'http://127.0.0.1:3000', 'sec-fetch-site': 'same-origin' } })
    expect(own.status).toBe(201)
    const script = await call(programsRoute.POST, { method: 'POST', cookie, rawBody: program('Script') })
    expect(script.status).toBe(201)
  })

  it('applies to the public password routes too', async () => {
    const res = await call(forgotRoute.POST, { method: 'POST', rawBody: JSON.stringify({ email: 'a@test.example' }), headers: { 'content-type': 'application/x-www-form-urlencoded' } })
    expect(res.status).toBe(415)
    const cross = await call(forgotRoute.POST, { method: 'POST', body: { email: 'a@test.example' }, headers: { origin: 'http://evil.test' } })
    expect(cross.status).toBe(403)
  })
})

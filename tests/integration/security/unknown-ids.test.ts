// A path id that cannot name anything — beyond an integer column, not digits, zero, an exponent —
// is a 404 in the one error shape, like a well-formed id that names nothing; never a 400 or a 500.
import { describe, expect, it } from 'vitest'
import * as mapRoute from '@/app/api/maps/[id]/route'
import * as setRoute from '@/app/api/sets/[id]/route'
import * as reportRoute from '@/app/api/reports/[id]/route'
import * as programRoute from '@/app/api/programs/[id]/route'
import { call, makeUser, sessionCookie } from '@/tests/support/api'

describe('unknown and malformed ids under /api', () => {
  it('answers 404 with the id rule for each malformed id, and 404 for a well-formed unknown one', async () => {
    const cookie = await sessionCookie(await makeUser('lead_engineer'))
    const cases = [
      { handler: mapRoute.GET, id: '99999999999999999999', name: 'Map id' },
      { handler: setRoute.GET, id: 'abc', name: 'Set id' },
      { handler: reportRoute.GET, id: '0', name: 'Report id' },
      { handler: programRoute.GET, id: '1e30', name: 'Program id' },
      // 2^31 is one past the largest integer column value (PostgreSQL manual, numeric types).
      { handler: setRoute.GET, id: '2147483648', name: 'Set id' },
    ]
    for (const c of cases) {
      const res = await call(c.handler as Parameters<typeof call>[0], { cookie, params: { id: c.id } })
      expect(res.status, `${c.name}=${c.id}`).toBe(404)
      expect(res.body.error.code).toBe('not_found')
      expect(res.body.error.message).toContain(`${c.name} "${c.id}" names nothing`)
    }
    // The largest id an integer column holds is well-formed: it reaches the database and names nothing.
    const top = await call(setRoute.GET as Parameters<typeof call>[0], { cookie, params: { id: '2147483647' } })
    expect(top.status).toBe(404)
    expect(top.body.error.message).toBe('Map set 2147483647 was not found')
  })

  it('shortens a long malformed id in the message', async () => {
    const cookie = await sessionCookie(await makeUser('test_driver'))
    const res = await call(mapRoute.GET as Parameters<typeof call>[0], { cookie, params: { id: 'x'.repeat(500) } })
    expect(res.status).toBe(404)
    expect(res.body.error.message.length).toBeLessThan(120)
  })
})

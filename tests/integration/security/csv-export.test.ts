import Papa from 'papaparse'
import { describe, expect, it } from 'vitest'
import * as auditRoute from '@/app/api/audit/route'
import * as programsRoute from '@/app/api/programs/route'
import { demoTipper } from '@/db/demo/programs'
import { hashPassword } from '@/app/_lib/auth/password'
import { createUser } from '@/db/queries/users'
import { call, makeUser, sessionCookie } from '@/tests/support/api'

const FORMULA_START = /^[=+\-@\t\r]/

describe('audit CSV export', () => {
  it('neutralises cells a spreadsheet would run as a formula', async () => {
    const names = ['=HYPERLINK("http://x.test","open")', "-2+3+cmd|' /C calc'!A0", '@SUM(1)', '+1', '\t=1', '=1\n=2']
    for (const name of names) {
      const actor = await createUser({ email: `csv-${Math.random().toString(36).slice(2)}@test.example`, name, role: 'admin', passwordHash: await hashPassword('whatever pass 1') })
      const res = await call(programsRoute.POST, { method: 'POST', cookie: await sessionCookie(actor), body: { name: `=1+1 ${name.length}`, description: '', params: demoTipper } })
      expect(res.status).toBe(201)
    }
    const admin = await sessionCookie(await makeUser('admin'))
    const req = new Request('http://127.0.0.1:3000/api/audit?format=csv&action=program.create', { headers: { cookie: admin } })
    const res = await auditRoute.GET(req, { params: Promise.resolve({}) })
    expect(res.status).toBe(200)
    const rows = Papa.parse<string[]>(await res.text(), { skipEmptyLines: true }).data
    const cells = rows.flat()
    for (const name of names) expect(cells).toContain(`'${name}`)
    expect(cells.filter((c) => FORMULA_START.test(c))).toEqual([])
  })
})

// The audit trail a page at a time: ?page= skips whole pages of `limit` rows, newest first, and
// says how many rows the filter matches in all; a bad page number is a 400 naming the field.
import { describe, expect, it } from 'vitest'
import * as auditRoute from '@/app/api/audit/route'
import { recordAudit } from '@/db/queries/audit'
import { auditSubjects, subjectOf } from '@/db/queries/audit-subjects'
import { call, makeUser, sessionCookie } from '@/tests/support/api'

describe('audit paging', () => {
  it('pages 7 matching rows 3 at a time: 3, 3, 1, then none; no row twice', async () => {
    const admin = await makeUser('admin')
    const cookie = await sessionCookie(admin)
    const action = `test.paging-${Date.now()}`
    for (let i = 1; i <= 7; i++) await recordAudit({ actorId: admin.id, action, entityType: 'user', entityId: admin.id, details: { i } })
    const page = async (n: string) => call(auditRoute.GET, { cookie, path: `/api/audit?action=${action}&limit=3&page=${n}` })
    const got = await Promise.all(['1', '2', '3', '4'].map(page))
    expect(got.map((r) => r.status)).toEqual([200, 200, 200, 200])
    expect(got.map((r) => r.body.entries.length)).toEqual([3, 3, 1, 0])
    expect(got[0].body).toMatchObject({ page: 1, pageSize: 3, total: 7 })
    // Newest first: the seventh row written is the first on page 1, the first written is the last on page 3.
    const seen = got.flatMap((r) => r.body.entries.map((e: { details: { i: number } }) => e.details.i))
    expect(seen).toEqual([7, 6, 5, 4, 3, 2, 1])
  })

  it('refuses page 0, a negative or a fractional page with 400 naming page', async () => {
    const cookie = await sessionCookie(await makeUser('lead_engineer'))
    for (const p of ['0', '-1', '1.5', 'two', '1e3']) {
      const res = await call(auditRoute.GET, { cookie, path: `/api/audit?page=${p}` })
      expect(res.status, p).toBe(400)
      expect(res.body.error.message).toMatch(/^page: page must be a whole number/)
    }
  })

  it('names what each row is about instead of its id, and says when it is gone', async () => {
    const admin = await makeUser('admin')
    const subjects = await auditSubjects([{ entityType: 'user', entityId: admin.id }, { entityType: 'map', entityId: 2_000_000_000 }])
    expect(subjectOf(subjects, { entityType: 'user', entityId: admin.id }).name).toBe(`${admin.name} (${admin.email})`)
    expect(subjectOf(subjects, { entityType: 'map', entityId: 2_000_000_000 })).toEqual({ name: 'map (no longer there)', href: null })
  })
})

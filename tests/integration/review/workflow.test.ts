import { describe, expect, it } from 'vitest'
import { unzipSync, strFromU8 } from 'fflate'
import * as packageRoute from '@/app/api/revisions/[revisionId]/package/route'
import { currentRelease } from '@/db/queries/review'
import { checksum } from '@/db/checksum'
import { fromCsv } from '@/maps'
import { makeUser, sessionCookie } from '@/tests/support/api'
import { act, capturedMail, fileReport, reviewSetup, stateOf } from '@/tests/support/review-fixtures'

describe('review workflow', () => {
  it('submit → send back (comment required) → new revision → approve → release, mail at each step', async () => {
    const s = await reviewSetup()
    expect((await act(s.revisionId, s.leadCookie, 'submit')).status).toBe(403) // only the author submits
    expect((await act(s.revisionId, s.cookie, 'submit')).status).toBe(200)
    expect(await stateOf(s.mapId, 2)).toBe('in_review')
    expect((await act(s.revisionId, s.leadCookie, 'send_back')).status).toBe(400)
    expect((await act(s.revisionId, s.leadCookie, 'send_back', { comment: 'Too soft at 50 %' })).status).toBe(200)
    expect(await stateOf(s.mapId, 2)).toBe('returned')
    expect((await act(s.revisionId, s.leadCookie, 'approve')).status).toBe(409)

    const mail = await capturedMail()
    const toLead = mail.filter((m) => m.to.includes(s.lead.email))
    expect(toLead.some((m) => /submitted a revision for review/.test(m.raw) && new RegExp(`Open: http://\\S+/review/${s.revisionId}\\r?\\n`).test(m.raw))).toBe(true)
    const toAuthor = mail.filter((m) => m.to.includes(s.engineer.email))
    expect(toAuthor.some((m) => /send back\./.test(m.raw) && /Comment: Too soft at 50 %/.test(m.raw))).toBe(true)
    expect(mail.every((m) => !m.to.includes(s.driver.email))).toBe(true)
  })

  it('releases only through the gate, retires the previous release and restores it on withdrawal', async () => {
    const s = await reviewSetup()
    await act(s.revisionId, s.cookie, 'submit')
    expect((await act(s.revisionId, s.leadCookie, 'approve')).status).toBe(200)
    const blocked = await act(s.revisionId, s.leadCookie, 'release')
    expect(blocked.status).toBe(409) // no drive report yet
    expect(blocked.body.error.message).toMatch(/No drive report/)
    await fileReport(s.revisionId, s.driverCookie)
    const released = await act(s.revisionId, s.leadCookie, 'release')
    expect(released.status).toBe(200)
    expect(await stateOf(s.mapId, 2)).toBe('released')
    expect((await currentRelease(s.mapId))?.number).toBe(2)

    // A package for the released revision, whose files match its checksum.
    const res = await packageRoute.GET(new Request('http://127.0.0.1/x', { headers: { cookie: s.driverCookie } }), { params: Promise.resolve({ revisionId: String(s.revisionId) }) })
    expect(res.status).toBe(200)
    const files = unzipSync(new Uint8Array(await res.arrayBuffer()))
    const manifest = JSON.parse(strFromU8(files['manifest.json']))
    expect(manifest).toMatchObject({ revision: 2, approver: s.lead.name })
    const csvName = Object.keys(files).find((f) => f.endsWith('.csv'))!
    expect(checksum(fromCsv(strFromU8(files[csvName]), 'drive'))).toBe(manifest.checksum)
    expect(strFromU8(files['CAUTION.txt'])).toMatch(/closed course/)

    // A later revision released by another lead retires r2; withdrawing it brings r2 back.
    const next = await reviewSetupOnSameMap(s)
    expect(await stateOf(s.mapId, 2)).toBe('retired')
    expect((await act(next, s.leadCookie, 'withdraw')).status).toBe(400) // a reason is required
    expect((await act(next, s.leadCookie, 'withdraw', { comment: 'Drivers report jerky tip-in' })).status).toBe(200)
    expect(await stateOf(s.mapId, 3)).toBe('withdrawn')
    expect(await stateOf(s.mapId, 2)).toBe('released')
    expect((await currentRelease(s.mapId))?.number).toBe(2)
  })

  it('lets exactly one of two leads approving at once win; the other gets 409', async () => {
    const s = await reviewSetup()
    await act(s.revisionId, s.cookie, 'submit')
    const other = await sessionCookie(await makeUser('lead_engineer'))
    const [a, b] = await Promise.all([act(s.revisionId, s.leadCookie, 'approve'), act(s.revisionId, other, 'approve')])
    expect([a.status, b.status].sort()).toEqual([200, 409])
  })
})

/** Save r3 on the same map, submit, approve, report and release it. */
async function reviewSetupOnSameMap(s: Awaited<ReturnType<typeof reviewSetup>>): Promise<number> {
  const revisionsRoute = await import('@/app/api/maps/[id]/revisions/route')
  const { call } = await import('@/tests/support/api')
  const { GENTLE } = await import('@/tests/support/review-fixtures')
  const saved = await call(revisionsRoute.POST, { method: 'POST', cookie: s.cookie, params: { id: String(s.mapId) }, body: { parentNumber: 2, message: 'Even gentler', table: { ...GENTLE, values: GENTLE.values.map((r) => r.map((v) => v * 0.9)) } } })
  const id = saved.body.revision.id as number
  await act(id, s.cookie, 'submit')
  await act(id, s.leadCookie, 'approve')
  await fileReport(id, s.driverCookie)
  const r = await act(id, s.leadCookie, 'release')
  if (r.status !== 200) throw new Error(JSON.stringify(r.body))
  return id
}

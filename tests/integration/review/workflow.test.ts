import { describe, expect, it } from 'vitest'
import { currentSetRelease } from '@/db/queries/sets'
import { makeUser, sessionCookie } from '@/tests/support/api'
import { act, capturedMail, GENTLE, reviewSetup, stateOf } from '@/tests/support/review-fixtures'
import { approve, fileCoveringReports, makeSet, releaseSet, saveRevision, setSetup, withdrawSet } from '@/tests/support/set-fixtures'

describe('review workflow', () => {
  it('submit → send back (comment required) → approve is refused from “sent back”, mail at each step', async () => {
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

  it('a set release retires the previous one and a withdrawal brings it back, revision states following', async () => {
    const s = await setSetup()
    await approve(s, s.driveRevisionId)
    await approve(s, s.regenRevisionId)
    const first = await makeSet(s)
    const blocked = await releaseSet(first, s.leadCookie)
    expect(blocked.status).toBe(409) // no drive report yet
    expect(blocked.body.error.message).toMatch(/No drive report/)
    await fileCoveringReports(first, s.driverCookie)
    expect((await releaseSet(first, s.leadCookie)).status).toBe(200)
    expect([await stateOf(s.mapId, 1), await stateOf(s.regenMapId, 1)]).toEqual(['released', 'released'])
    expect((await currentSetRelease(s.programId))?.setId).toBe(first)
    const mail = await capturedMail()
    expect(mail.some((m) => m.to.includes(s.engineer.email) && /Package SHA-256:/.test(m.raw))).toBe(true)

    // Set 2 keeps the regen revision and takes a new drive revision: releasing it retires drive r1 only.
    const d2 = await saveRevision(s, s.mapId, 1, { ...GENTLE, values: GENTLE.values.map((r) => r.map((v) => v * 0.9)) }, 'Even gentler')
    await approve(s, d2)
    const second = await makeSet(s, { driveRevisionId: d2 })
    await fileCoveringReports(second, s.driverCookie)
    expect((await releaseSet(second, s.leadCookie)).status).toBe(200)
    expect([await stateOf(s.mapId, 1), await stateOf(s.mapId, 2), await stateOf(s.regenMapId, 1)]).toEqual(['retired', 'released', 'released'])
    expect((await withdrawSet(second, s.leadCookie, '')).status).toBe(400) // a reason is required
    expect((await withdrawSet(second, s.cookie, 'not mine to withdraw')).status).toBe(403)
    expect((await withdrawSet(second, s.leadCookie, 'Drivers report jerky tip-in')).status).toBe(200)
    expect([await stateOf(s.mapId, 1), await stateOf(s.mapId, 2), await stateOf(s.regenMapId, 1)]).toEqual(['released', 'withdrawn', 'released'])
    expect((await currentSetRelease(s.programId))?.setId).toBe(first)
  })

  it('lets exactly one of two leads approving at once win; the other gets 409', async () => {
    const s = await reviewSetup()
    await act(s.revisionId, s.cookie, 'submit')
    const other = await sessionCookie(await makeUser('lead_engineer'))
    const [a, b] = await Promise.all([act(s.revisionId, s.leadCookie, 'approve'), act(s.revisionId, other, 'approve')])
    expect([a.status, b.status].sort()).toEqual([200, 409])
  })
})

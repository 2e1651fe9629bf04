import { describe, expect, it } from 'vitest'
import { saveRevision } from '@/db/queries/revisions'
import { latestDraftsBy, sentBackTo, transitionRevision } from '@/db/queries/review'
import { waitingFor } from '@/app/_lib/review/waiting'
import { makeUser } from '@/tests/support/api'
import { programAndMap, SMALL_DRIVE, withCell } from '@/tests/support/fixtures'

async function save(mapId: number, authorId: number, parentNumber: number) {
  const r = await saveRevision({ mapId, parentNumber, authorId, message: `r${parentNumber + 1}`, notes: '', table: withCell(SMALL_DRIVE, 1, 1, 100 + parentNumber) })
  if (!r.ok) throw new Error(`save failed: ${r.reason}`)
  return r.revision
}

describe("an engineer's own work in the review queue and on the overview", () => {
  it('lists a map only while its latest revision is a draft by that engineer', async () => {
    const mine = await programAndMap()
    const overtaken = await programAndMap()
    const colleague = await makeUser('calibration_engineer')
    const r2 = await save(mine.mapId, mine.engineer.id, 1)
    // Here a colleague saved after the engineer: the engineer's draft r2 is history, not work.
    await save(overtaken.mapId, overtaken.engineer.id, 1)
    await save(overtaken.mapId, colleague.id, 2)

    const drafts = await latestDraftsBy(mine.engineer.id)
    expect(drafts.map((d) => [d.mapId, d.number])).toEqual([[mine.mapId, 2]])
    expect(drafts[0]).toMatchObject({ id: r2.id, mapName: 'Launch', message: 'r2', authorId: mine.engineer.id })
    expect((await latestDraftsBy(overtaken.engineer.id)).map((d) => d.mapId)).not.toContain(overtaken.mapId)
    expect((await latestDraftsBy(colleague.id)).map((d) => [d.mapId, d.number])).toEqual([[overtaken.mapId, 3]])

    // Submitted, it leaves the list.
    await transitionRevision({ revisionId: r2.id, actorId: mine.engineer.id, action: 'submit', from: 'draft', to: 'in_review', comment: '' })
    expect(await latestDraftsBy(mine.engineer.id)).toEqual([])
  })

  it("shows the lead's newest send-back comment, as markdown, beside the revision on the overview", async () => {
    const { mapId, engineer } = await programAndMap()
    const lead = await makeUser('lead_engineer')
    const r2 = await save(mapId, engineer.id, 1)
    const step = (action: 'submit' | 'send_back', actorId: number, from: 'draft' | 'in_review' | 'returned', to: 'in_review' | 'returned', comment: string) =>
      transitionRevision({ revisionId: r2.id, actorId, action, from, to, comment })
    await step('submit', engineer.id, 'draft', 'in_review', '')
    await step('send_back', lead.id, 'in_review', 'returned', 'First look: too steep')

    // In the app a new revision follows a send-back; walked back by hand here to see that the newest comment wins.
    await transitionRevision({ revisionId: r2.id, actorId: engineer.id, action: 'submit', from: 'returned', to: 'in_review', comment: '' })
    await step('send_back', lead.id, 'in_review', 'returned', '**Halve** the step at 15 km/h')

    const back = await sentBackTo(engineer.id)
    expect(back).toHaveLength(1)
    expect(back[0]).toMatchObject({ id: r2.id, number: 2, comment: '**Halve** the step at 15 km/h', sentBackBy: lead.name })
    const box = (await waitingFor(engineer)).find((b) => b.testId === 'waiting-returned')
    expect(box?.items).toEqual([expect.objectContaining({ href: `/review/${r2.id}`, detail: `sent back by ${lead.name}`, note: '**Halve** the step at 15 km/h' })])
    // Another engineer sees none of it.
    expect(await sentBackTo((await makeUser('calibration_engineer')).id)).toEqual([])
  })
})

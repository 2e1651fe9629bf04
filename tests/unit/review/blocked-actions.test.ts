// What a person's role could do in this state but may not do to this revision is said, with why.
import { describe, expect, it } from 'vitest'
import { availableActions, blockedActions } from '@/app/_lib/review/states'

const lead = { id: 7, role: 'lead_engineer' as const }
const engineer = { id: 3, role: 'calibration_engineer' as const }

describe('blocked review actions', () => {
  it('tells a lead why they cannot approve their own revision, and still offers sending it back', () => {
    expect(availableActions('in_review', lead, lead.id)).toEqual(['send_back'])
    expect(blockedActions('in_review', lead, lead.id)).toEqual([{ action: 'approve', reason: 'A lead engineer cannot approve their own revision; another lead must review it' }])
  })

  it("tells an engineer that only the author submits a colleague's draft", () => {
    expect(blockedActions('draft', engineer, 99)).toEqual([{ action: 'submit', reason: 'Only the author of a revision submits it for review' }])
  })

  it('says nothing about actions outside the role or the state, or done on a set', () => {
    expect(blockedActions('in_review', lead, 99)).toEqual([])
    expect(blockedActions('in_review', engineer, engineer.id)).toEqual([])
    expect(blockedActions('approved', lead, lead.id)).toEqual([])
    expect(blockedActions('released', lead, lead.id)).toEqual([])
  })
})

import { describe, expect, it } from 'vitest'
import { availableActions, checkTransition } from '@/app/_lib/review/states'
import { REVISION_STATES, type RevisionState } from '@/domain/revision-states'
import { type ReviewAction } from '@/domain/review-actions'
import { ROLES, type Role } from '@/domain/roles'

const AUTHOR = 1
const OTHER = 2

// The whole table of allowed transitions (from → action → to, by role); everything else is refused.
const ALLOWED: { action: ReviewAction; from: RevisionState; to: RevisionState; roles: Role[] }[] = [
  { action: 'submit', from: 'draft', to: 'in_review', roles: ['calibration_engineer', 'lead_engineer'] },
  { action: 'approve', from: 'in_review', to: 'approved', roles: ['lead_engineer'] },
  { action: 'send_back', from: 'in_review', to: 'returned', roles: ['lead_engineer'] },
]

describe('revision state machine', () => {
  it('allows exactly the listed transitions, for exactly the listed roles, from exactly the listed state', () => {
    for (const action of ['submit', 'approve', 'send_back'] as ReviewAction[]) {
      for (const state of REVISION_STATES) {
        for (const role of ROLES) {
          // The author submits; someone else approves (four eyes); others are neutral.
          const actorId = action === 'submit' ? AUTHOR : OTHER
          const result = checkTransition(action, state, { id: actorId, role }, AUTHOR, 'because')
          const rule = ALLOWED.find((r) => r.action === action)!
          const expected = rule.from === state && rule.roles.includes(role)
          expect({ action, state, role, ok: result.ok }).toEqual({ action, state, role, ok: expected })
          if (result.ok) expect(result.to).toBe(rule.to)
          else if (!rule.roles.includes(role)) expect(result.status).toBe(403)
          else expect(result.status).toBe(409)
        }
      }
    }
  })

  it('lets only the author submit, and never the author approve', () => {
    expect(checkTransition('submit', 'draft', { id: OTHER, role: 'calibration_engineer' }, AUTHOR)).toMatchObject({ ok: false, status: 403 })
    expect(checkTransition('approve', 'in_review', { id: AUTHOR, role: 'lead_engineer' }, AUTHOR)).toMatchObject({ ok: false, status: 403 })
  })

  it('never releases or withdraws one revision: that is done on a map set', () => {
    for (const action of ['release', 'withdraw'] as ReviewAction[])
      for (const state of REVISION_STATES)
        expect(checkTransition(action, state, { id: OTHER, role: 'lead_engineer' }, AUTHOR, 'because')).toMatchObject({ ok: false, status: 409, reason: expect.stringMatching(/map set/) })
  })

  it('needs a comment to send back', () => {
    expect(checkTransition('send_back', 'in_review', { id: OTHER, role: 'lead_engineer' }, AUTHOR, '  ')).toMatchObject({ ok: false, status: 400 })
    expect(checkTransition('send_back', 'in_review', { id: OTHER, role: 'lead_engineer' }, AUTHOR, 'cell 3,4 too steep').ok).toBe(true)
  })

  it('lists the actions available to a person', () => {
    expect(availableActions('in_review', { id: OTHER, role: 'lead_engineer' }, AUTHOR)).toEqual(['approve', 'send_back'])
    expect(availableActions('in_review', { id: AUTHOR, role: 'lead_engineer' }, AUTHOR)).toEqual(['send_back'])
    expect(availableActions('draft', { id: AUTHOR, role: 'calibration_engineer' }, AUTHOR)).toEqual(['submit'])
    expect(availableActions('released', { id: OTHER, role: 'test_driver' }, AUTHOR)).toEqual([])
  })
})

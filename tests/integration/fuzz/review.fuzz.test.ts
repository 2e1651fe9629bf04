// Fuzzed bodies against the review routes: actions (the author submits, a lead sends back) and
// review comments pinned to a cell.
import { describe, it } from 'vitest'
import * as actionsRoute from '@/app/api/revisions/[revisionId]/actions/route'
import * as reviewCommentsRoute from '@/app/api/revisions/[revisionId]/comments/route'
import { reviewActionSchema, reviewCommentSchema } from '@/app/_schemas/review'
import { act, reviewSetup } from '@/tests/support/review-fixtures'
import { fuzzRoute } from './harness'

describe('fuzz: review', () => {
  it('POST /api/revisions/:revisionId/actions (author submits; lead sends back)', async () => {
    const s = await reviewSetup()
    const params = { revisionId: String(s.revisionId) }
    await fuzzRoute({ name: 'POST /api/revisions/:revisionId/actions (author)', handler: actionsRoute.POST, method: 'POST', cookie: s.cookie, params, schema: reviewActionSchema, valid: { action: 'submit', comment: 'Ready for review', acknowledgements: [] } })
    const t = await reviewSetup()
    await act(t.revisionId, t.cookie, 'submit')
    await fuzzRoute({ name: 'POST /api/revisions/:revisionId/actions (lead)', handler: actionsRoute.POST, method: 'POST', cookie: t.leadCookie, params: { revisionId: String(t.revisionId) }, schema: reviewActionSchema, valid: { action: 'send_back', comment: 'Too soft at half pedal', acknowledgements: [{ key: 'traction:wet-asphalt', reason: 'closed course only' }] } })
  }, 120_000)

  it('POST /api/revisions/:revisionId/comments', async () => {
    const s = await reviewSetup()
    await fuzzRoute({ name: 'POST /api/revisions/:revisionId/comments', handler: reviewCommentsRoute.POST, method: 'POST', cookie: s.cookie, params: { revisionId: String(s.revisionId) }, schema: reviewCommentSchema, valid: { body: 'This cell jumps 300 N·m', row: 1, col: 2 } })
  }, 120_000)
})

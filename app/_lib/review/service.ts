import 'server-only'
import { getRevisionWithMap, type MapWithProgram } from '@/db/queries/maps'
import { emailOfUser, emailsOfRole, type OutgoingMail } from '@/db/queries/mail'
import type { Revision } from '@/db/queries/revisions'
import { transitionRevision } from '@/db/queries/review'
import { ConflictError, HttpError, NotFoundError } from '../http/errors'
import { appUrl, nudgeMail } from '../mail/sender'
import type { SessionUser } from '../auth/session'
import { ACTION_LABELS, type ReviewAction } from '@/domain/review-actions'
import { STATE_LABELS, type RevisionState } from '@/domain/revision-states'
import { checkTransition } from './states'

export interface RevisionContext {
  revision: Revision
  map: MapWithProgram
}

/** A revision by its row id, with its map and program. */
export async function loadRevisionContext(revisionId: number): Promise<RevisionContext> {
  const found = await getRevisionWithMap(revisionId)
  if (!found) throw new NotFoundError(`Revision ${revisionId}`)
  return found
}

async function mailFor(action: ReviewAction, ctx: RevisionContext, actor: SessionUser, comment: string): Promise<OutgoingMail[]> {
  const { map, revision: r } = ctx
  const what = `${map.programName} · ${map.name} r${r.number}`
  const link = appUrl(`/review/${r.id}`)
  const body = (line: string) => `${line}\n\n${what}\n"${r.message}"\n${comment ? `\nComment: ${comment}\n` : ''}\nOpen: ${link}\n`
  switch (action) {
    case 'submit':
      return [{ to: await emailsOfRole('lead_engineer'), subject: `Review requested: ${what}`, text: body(`${actor.name} submitted a revision for review.`) }]
    case 'approve':
    case 'send_back':
      return [{ to: await emailOfUser(r.authorId), subject: `${ACTION_LABELS[action]}: ${what}`, text: body(`${actor.name}: ${ACTION_LABELS[action].toLowerCase()}.`) }]
    case 'release':
    case 'withdraw':
      return [] // done on a set (app/_lib/sets/service.ts), which sends its own mail
  }
}

/**
 * Take a review action on a revision (submit, approve, send back): checked by role, ownership
 * and current state. Release and withdrawal are done on a set. Everything the action changes
 * commits together, mail included.
 */
export async function applyReviewAction(ctx: RevisionContext, actor: SessionUser, action: ReviewAction, opts: { comment?: string } = {}): Promise<{ state: RevisionState }> {
  const { revision: r } = ctx
  const state = r.state
  const comment = opts.comment?.trim() ?? ''
  const check = checkTransition(action, state, actor, r.authorId, comment)
  if (!check.ok) throw new HttpError(check.status, check.status === 403 ? 'forbidden' : check.status === 400 ? 'invalid_input' : 'conflict', check.reason)
  const result = await transitionRevision({ revisionId: r.id, actorId: actor.id, action, from: state, to: check.to, comment, mail: await mailFor(action, ctx, actor, comment) })
  if (!result.ok) throw new ConflictError(`Someone else got there first: revision ${r.number} is now “${result.currentState === 'missing' ? result.currentState : STATE_LABELS[result.currentState]}”`)
  nudgeMail()
  return { state: check.to }
}

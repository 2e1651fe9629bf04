import 'server-only'
import { getRevisionWithMap, type MapWithProgram } from '@/db/queries/maps'
import { emailOfUser, emailsOfRole, type OutgoingMail } from '@/db/queries/mail'
import { listReports } from '@/db/queries/reports'
import type { Revision } from '@/db/queries/revisions'
import { recordRelease, recordWithdrawal, transitionRevision } from '@/db/queries/review'
import { ConflictError, HttpError, NotFoundError } from '../http/errors'
import { appUrl, nudgeMail } from '../mail/sender'
import type { SessionUser } from '../auth/session'
import { releaseGate, type GateResult } from './gate'
import { ACTION_LABELS, type ReviewAction } from '@/domain/review-actions'
import { STATE_LABELS, type RevisionState } from '@/domain/revision-states'
import type { Acknowledgement } from '@/db/schema'
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

export async function gateFor(ctx: RevisionContext, acknowledgements: Acknowledgement[] = []): Promise<GateResult> {
  const reports = await listReports({ revisionId: ctx.revision.id })
  return releaseGate({ table: ctx.revision.table, vehicle: ctx.map.programParams, conditions: ctx.map.programReleaseConditions, reports, acknowledgements })
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
    case 'release':
      return [{ to: await emailOfUser(r.authorId), subject: `${ACTION_LABELS[action]}: ${what}`, text: body(`${actor.name}: ${ACTION_LABELS[action].toLowerCase()}.`) }]
    case 'withdraw':
      return [{ to: [...new Set([...(await emailOfUser(r.authorId)), ...(await emailsOfRole('lead_engineer'))])], subject: `Release withdrawn: ${what}`, text: body(`${actor.name} withdrew the release.`) }]
  }
}

/**
 * Take a review action on a revision: checked by role, ownership and current state; a release
 * also passes the gate. Everything the action changes commits together, mail included.
 */
export async function applyReviewAction(
  ctx: RevisionContext,
  actor: SessionUser,
  action: ReviewAction,
  opts: { comment?: string; acknowledgements?: Acknowledgement[] } = {},
): Promise<{ state: RevisionState; gate?: GateResult }> {
  const { revision: r, map } = ctx
  const state = r.state
  const comment = opts.comment?.trim() ?? ''
  const check = checkTransition(action, state, actor, r.authorId, comment)
  if (!check.ok) throw new HttpError(check.status, check.status === 403 ? 'forbidden' : check.status === 400 ? 'invalid_input' : 'conflict', check.reason)
  let gate: GateResult | undefined
  const acknowledgements = (opts.acknowledgements ?? []).filter((a) => a.reason.trim())
  if (action === 'release') {
    gate = await gateFor(ctx, acknowledgements)
    if (!gate.ok) throw new ConflictError('The release gate is not passed: ' + gate.conditions.filter((c) => !c.met).map((c) => c.summary).join('; '), { gate })
  }
  const result = await transitionRevision({
    revisionId: r.id,
    actorId: actor.id,
    action,
    from: state,
    to: check.to,
    comment,
    mail: await mailFor(action, ctx, actor, comment),
    extra:
      action === 'release'
        ? async (tx) => void (await recordRelease(tx, { mapId: map.id, revisionId: r.id, releasedBy: actor.id, acknowledgements }))
        : action === 'withdraw'
          ? async (tx) => void (await recordWithdrawal(tx, { mapId: map.id, revisionId: r.id, actorId: actor.id, reason: comment }))
          : undefined,
  })
  if (!result.ok) throw new ConflictError(`Someone else got there first: revision ${r.number} is now “${result.currentState === 'missing' ? result.currentState : STATE_LABELS[result.currentState]}”`)
  nudgeMail()
  return { state: check.to, gate }
}

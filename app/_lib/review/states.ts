/**
 * The review workflow of a revision as a pure state machine: which action moves which state, and
 * who may take it. The server checks every transition here before it touches the database.
 */
import 'server-only'
import type { Role } from '@/domain/roles'
import { REVIEW_ACTIONS, ACTION_LABELS, type ReviewAction } from '@/domain/review-actions'
import { STATE_LABELS, type RevisionState } from '@/domain/revision-states'

interface Rule {
  from: RevisionState
  to: RevisionState
  roles: readonly Role[]
  /** A comment (reason) is required. */
  needsComment: boolean
}

const RULES: Record<ReviewAction, Rule> = {
  submit: { from: 'draft', to: 'in_review', roles: ['calibration_engineer', 'lead_engineer'], needsComment: false },
  approve: { from: 'in_review', to: 'approved', roles: ['lead_engineer'], needsComment: false },
  send_back: { from: 'in_review', to: 'returned', roles: ['lead_engineer'], needsComment: true },
  release: { from: 'approved', to: 'released', roles: ['lead_engineer'], needsComment: false },
  withdraw: { from: 'released', to: 'withdrawn', roles: ['lead_engineer'], needsComment: true },
}

/** Actions taken on a set, never on one revision: a truck runs a drive and a regen map together. */
const SET_ACTIONS: readonly ReviewAction[] = ['release', 'withdraw']

export type TransitionCheck =
  | { ok: true; to: RevisionState }
  | { ok: false; status: 403 | 409 | 400; reason: string }

/**
 * May `actor` take `action` on a revision in `state` written by `authorId`?
 * Only the author submits; nobody approves their own revision (a second pair of eyes).
 * @example checkTransition('approve', 'in_review', { id: 2, role: 'lead_engineer' }, 1) // { ok: true, to: 'approved' }
 */
export function checkTransition(action: ReviewAction, state: RevisionState, actor: { id: number; role: Role }, authorId: number, comment = ''): TransitionCheck {
  const rule = RULES[action]
  if (SET_ACTIONS.includes(action)) return { ok: false, status: 409, reason: `${ACTION_LABELS[action]} is done on a map set (a drive map, a regen map and a parameter version together), not on one revision` }
  if (!rule.roles.includes(actor.role)) return { ok: false, status: 403, reason: `${ACTION_LABELS[action]} needs the role ${rule.roles.join(' or ').replace(/_/g, ' ')}` }
  if (state !== rule.from) return { ok: false, status: 409, reason: `${ACTION_LABELS[action]} is possible only from “${STATE_LABELS[rule.from]}”; this revision is “${STATE_LABELS[state]}”` }
  if (action === 'submit' && actor.id !== authorId) return { ok: false, status: 403, reason: 'Only the author of a revision submits it for review' }
  if (action === 'approve' && actor.id === authorId) return { ok: false, status: 403, reason: 'A lead engineer cannot approve their own revision; another lead must review it' }
  if (rule.needsComment && !comment.trim()) return { ok: false, status: 400, reason: `${ACTION_LABELS[action]} needs a comment saying why` }
  return { ok: true, to: rule.to }
}

/** The actions this actor could take now (for showing buttons; the server re-checks). */
export function availableActions(state: RevisionState, actor: { id: number; role: Role }, authorId: number): ReviewAction[] {
  return REVIEW_ACTIONS.filter((a) => {
    const c = checkTransition(a, state, actor, authorId, 'x')
    return c.ok
  })
}

/**
 * Actions this actor's role could take in this state but may not take on this revision (approving
 * their own, submitting someone else's), with the reason: shown instead of a missing button.
 */
export function blockedActions(state: RevisionState, actor: { id: number; role: Role }, authorId: number): { action: ReviewAction; reason: string }[] {
  return REVIEW_ACTIONS.flatMap((a) => {
    const rule = RULES[a]
    if (SET_ACTIONS.includes(a) || !rule.roles.includes(actor.role) || rule.from !== state) return []
    const c = checkTransition(a, state, actor, authorId, 'x')
    return c.ok ? [] : [{ action: a, reason: c.reason }]
  })
}

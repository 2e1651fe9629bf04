/**
 * How the audit trail reads to a person: a plain label for each stored action id, and a short
 * sentence made from the row's details. The raw details stay available beside it; an action this
 * file does not know shows its id and no sentence rather than a guess.
 */
import { isRole, ROLE_LABELS } from './roles'
import { isState, STATE_LABELS } from './revision-states'

export const AUDIT_ACTION_LABELS: Readonly<Record<string, string>> = {
  'auth.signin': 'Signed in',
  'auth.failed': 'Sign-in refused',
  'auth.invite-link': 'Invitation e-mailed',
  'auth.reset-link': 'Password-reset link e-mailed',
  'auth.invite-used': 'Password set from the invitation',
  'auth.reset-used': 'Password reset',
  'user.create': 'Account added',
  'user.invite': 'User invited',
  'user.invite-resend': 'Invitation sent again',
  'user.update': 'Account changed',
  'map.create': 'Map made',
  'revision.save': 'Revision saved',
  'revision.import': 'Revision imported',
  'revision.comment': 'Revision commented',
  'revision.submit': 'Submitted for review',
  'revision.approve': 'Approved',
  'revision.send_back': 'Sent back',
  'program.create': 'Program made',
  'program.update': 'Program renamed or described',
  'program.new-param-version': 'New parameter version',
  'set.create': 'Map set made',
  'set.release': 'Map set released',
  'set.withdraw': 'Release withdrawn',
  'report.create': 'Drive report filed',
  'report.update': 'Drive report changed',
  'report.read': 'Drive report read',
  'report.comment': 'Drive report commented',
  'report.safety-resolved': 'Safety concern resolved',
  'report.set-corrected': "Report's set corrected",
  'report.log-upload': 'Log uploaded',
  'report.log-remove': 'Log removed',
  'report.log-reanalyse': 'Log analysed again',
  'report.log-remap': 'Log columns mapped again',
}

/** @example auditActionLabel('set.withdraw') // 'Release withdrawn' */
export function auditActionLabel(action: string): string {
  return AUDIT_ACTION_LABELS[action] ?? action
}

type Details = Readonly<Record<string, unknown>>

const str = (v: unknown): string | null => (typeof v === 'string' && v.trim() !== '' ? v.trim() : null)
const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null)
/** A quoted reason or message, cut to one line of reading. */
const quote = (v: unknown): string | null => {
  const s = str(v)
  if (!s) return null
  const line = s.replace(/\s+/g, ' ')
  return `“${line.length > 120 ? `${line.slice(0, 119)}…` : line}”`
}
const role = (v: unknown) => (typeof v === 'string' && isRole(v) ? ROLE_LABELS[v] : null)
const state = (v: unknown) => (typeof v === 'string' && isState(v) ? STATE_LABELS[v] : null)
/** 1 536 000 → "1.5 MB"; below 1 MB in kB. */
const size = (v: unknown) => {
  const n = num(v)
  if (n === null) return null
  return n < 1_000_000 ? `${Math.max(1, Math.round(n / 1000))} kB` : `${(n / 1_000_000).toFixed(1)} MB`
}
const join = (...parts: (string | null | false)[]) => parts.filter(Boolean).join(' ')

/**
 * One short sentence about an audit row's details, or '' when they hold nothing worth saying.
 * @example auditSentence('set.withdraw', { reason: 'Judder on wet ramps' }) // 'Reason: “Judder on wet ramps”.'
 */
export function auditSentence(action: string, d: Details): string {
  const s = sentence(action, d)
  if (!s) return ''
  // A revision number (r4) or an e-mail address keeps its case at the start of a sentence.
  const first = s.split(' ')[0]
  const keep = /^r\d+$/.test(first) || first.includes('@')
  return `${keep ? s : `${s.charAt(0).toUpperCase()}${s.slice(1)}`}${/[.”?!]$/.test(s) ? '' : '.'}`
}

function sentence(action: string, d: Details): string {
  switch (action) {
    case 'auth.failed':
    case 'auth.signin':
      return str(d.ip) ? `from ${str(d.ip)}` : ''
    case 'user.invite':
    case 'user.create':
      return join(str(d.email), role(d.role) && `as ${role(d.role)}`)
    case 'user.invite-resend':
      return join(str(d.email) && `to ${str(d.email)}`)
    case 'user.update': {
      const parts = [
        role(d.role) && `role set to ${role(d.role)}`,
        d.disabled === true && 'disabled',
        d.disabled === false && 'enabled again',
        str(d.name) && `name set to ${str(d.name)}`,
        d.passwordChanged === true && 'password changed',
      ].filter((p): p is string => Boolean(p))
      return parts.join('; ')
    }
    case 'map.create':
      return join(str(d.kind) && `${str(d.kind)} map`, quote(d.name))
    case 'revision.save':
    case 'revision.import': {
      const n = num(d.number)
      return join(n !== null && `r${n}:`, quote(d.message))
    }
    case 'revision.comment': {
      const n = num(d.revision)
      return n !== null ? `on r${n}${num(d.row) !== null ? ', on one cell' : ''}` : ''
    }
    case 'revision.submit':
    case 'revision.approve':
    case 'revision.send_back': {
      const n = num(d.revision)
      const move = state(d.from) && state(d.to) ? `${state(d.from)} → ${state(d.to)}` : null
      return join(n !== null && `r${n}`, move && `(${move})`, quote(d.comment) && `— ${quote(d.comment)}`)
    }
    case 'program.create':
      return join(quote(d.name), num(d.paramVersion) !== null && `with parameter version ${num(d.paramVersion)}`)
    case 'program.update':
    case 'program.new-param-version': {
      const changes = Array.isArray(d.changes) ? d.changes.length : 0
      return join(
        num(d.paramVersion) !== null && `version ${num(d.paramVersion)}`,
        changes > 0 && `(${changes} change${changes === 1 ? '' : 's'})`,
        quote(d.reason) && `— ${quote(d.reason)}`,
      )
    }
    case 'set.create':
      return num(d.number) !== null ? `Set ${num(d.number)}` : ''
    case 'set.release': {
      const acks = Array.isArray(d.acknowledgements) ? d.acknowledgements.length : 0
      return join(acks > 0 ? `with ${acks} traction exception${acks === 1 ? '' : 's'} acknowledged` : 'with no traction exception', d.replacedSetId !== null && d.replacedSetId !== undefined && '; it replaced the earlier release')
    }
    case 'set.withdraw':
      return join(quote(d.reason) && `reason: ${quote(d.reason)}`, d.restoredSetId !== null && d.restoredSetId !== undefined && '— the release before it is back in the trucks')
    case 'report.create':
      return d.safety === true ? 'with a safety flag' : ''
    case 'report.update':
      return d.safety === true ? 'it carries a safety flag' : ''
    case 'report.safety-resolved':
      return quote(d.comment) ?? ''
    case 'report.set-corrected':
      return quote(d.reason) ? `reason: ${quote(d.reason)}` : ''
    case 'report.log-upload':
    case 'report.log-remove':
      return join(quote(d.fileName), size(d.sizeBytes) && `(${size(d.sizeBytes)})`)
    case 'report.log-reanalyse':
      return join(quote(d.fileName), quote(d.why) && `— ${quote(d.why)}`)
    case 'report.log-remap': {
      const n = d.to && typeof d.to === 'object' ? Object.keys(d.to).length : 0
      return join(quote(d.fileName), `— ${n === 0 ? 'no column mapped (the file’s own names)' : `${n} column${n === 1 ? '' : 's'} mapped`}`)
    }
    default:
      return ''
  }
}

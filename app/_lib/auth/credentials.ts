import 'server-only'
import { getUserCredentials } from '@/db/queries/users'
import { recordAudit } from '@/db/queries/audit'
import { randomBytes } from 'node:crypto'
import { hashPassword, verifyPassword } from './password'
import type { SessionUser } from './session'
import { checkAttempt, clearFailures, recordFailure } from './sign-in-limiter'

/** Thrown when sign-ins for this account or address are refused for a while. */
export class SignInLockedError extends Error {
  constructor(readonly retryAfterS: number) {
    super(`Too many failed sign-ins. Try again in ${Math.ceil(retryAfterS / 60)} minute(s).`)
  }
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms))

/**
 * Check an email and password against the stored argon2id hash. Disabled accounts never pass.
 * Repeated failures are slowed down, then refused a while from the failing address.
 * Returns the user for the session, or null; failures are audited against the account.
 */
export async function checkCredentials(email: string, password: string, ip: string | null = null): Promise<(SessionUser & { sessionVersion: number }) | null> {
  if (!email.trim() || !password) return null
  const account = email.trim().toLowerCase()
  const address = ip ?? 'unknown'
  // The account's own count only slows attempts down; the hard lock is per account × address and per
  // address, so failures from elsewhere never lock the owner out (docs/security.md).
  const slowOnly = [`account:${account}`]
  const refusing = [`pair:${account}|${address}`, ...(ip ? [`ip:${ip}`] : [])]
  const verdict = await checkAttempt(refusing, slowOnly)
  if (!verdict.allowed) throw new SignInLockedError(verdict.retryAfterS)
  if (verdict.delayMs) await sleep(verdict.delayMs)
  const user = await getUserCredentials(email)
  // Unknown and disabled accounts are checked against a dummy hash: every answer costs one argon2id verify.
  const verified = await verifyPassword(user && !user.disabled ? user.passwordHash : await dummyHash(), password)
  if (!verified || !user || user.disabled) {
    await recordFailure([...slowOnly, ...refusing])
    if (user) await recordAudit({ actorId: user.id, action: 'auth.failed', entityType: 'user', entityId: user.id, details: { ip } })
    return null
  }
  await clearFailures([...slowOnly, refusing[0]])
  await recordAudit({ actorId: user.id, action: 'auth.signin', entityType: 'user', entityId: user.id, details: { ip } })
  return { id: user.id, email: user.email, name: user.name, role: user.role, sessionVersion: user.sessionVersion }
}

let dummy: Promise<string> | undefined
/** A hash of a random password, made once, with the same parameters as real ones. */
function dummyHash(): Promise<string> {
  dummy ??= hashPassword(randomBytes(24).toString('base64url'))
  return dummy
}

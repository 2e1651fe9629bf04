import { getUserCredentials } from '@/db/queries/users'
import { recordAudit } from '@/db/queries/audit'
import { verifyPassword } from './password'
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
 * Repeated failures for the account or from the address are slowed down, then refused a while.
 * Returns the user for the session, or null; failures are audited against the account.
 */
export async function checkCredentials(email: string, password: string, ip: string | null = null): Promise<(SessionUser & { sessionVersion: number }) | null> {
  if (!email.trim() || !password) return null
  const keys = [`account:${email.trim().toLowerCase()}`, ...(ip ? [`ip:${ip}`] : [])]
  const verdict = checkAttempt(keys)
  if (!verdict.allowed) throw new SignInLockedError(verdict.retryAfterS)
  if (verdict.delayMs) await sleep(verdict.delayMs)
  const user = await getUserCredentials(email)
  const ok = Boolean(user && !user.disabled && (await verifyPassword(user.passwordHash, password)))
  if (!ok || !user) {
    recordFailure(keys)
    if (user) await recordAudit({ actorId: user.id, action: 'auth.failed', entityType: 'user', entityId: user.id, details: { ip } })
    return null
  }
  clearFailures([keys[0]])
  await recordAudit({ actorId: user.id, action: 'auth.signin', entityType: 'user', entityId: user.id, details: { ip } })
  return { id: user.id, email: user.email, name: user.name, role: user.role, sessionVersion: user.sessionVersion }
}

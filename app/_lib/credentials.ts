import { getUserCredentials } from '@/db/queries/users'
import { recordAudit } from '@/db/queries/audit'
import { verifyPassword } from './password'
import type { SessionUser } from './session'

/**
 * Check an email and password against the stored argon2id hash. Disabled accounts never pass.
 * Returns the user for the session, or null; failures are audited against the account.
 */
export async function checkCredentials(email: string, password: string): Promise<SessionUser | null> {
  if (!email.trim() || !password) return null
  const user = await getUserCredentials(email)
  if (!user || user.disabled) return null
  if (!(await verifyPassword(user.passwordHash, password))) {
    await recordAudit({ actorId: user.id, action: 'auth.failed', entityType: 'user', entityId: user.id })
    return null
  }
  await recordAudit({ actorId: user.id, action: 'auth.signin', entityType: 'user', entityId: user.id })
  return { id: user.id, email: user.email, name: user.name, role: user.role }
}

import 'server-only'
import type { LinkKind } from '@/domain/one-time-links'
import { randomBytes } from 'node:crypto'
import { sha256Hex } from '@/db/checksum'
import { createAuthToken, consumeAuthToken } from '@/db/queries/auth-tokens'
import { appUrl, nudgeMail } from '../mail/sender'
import { hashPassword } from './password'

export const INVITE_HOURS = 72
export const RESET_HOURS = 1

const hashToken = (token: string) => sha256Hex(token)

/** Make a one-time link for a user and e-mail it. Only the token's hash is stored. */
export async function sendOneTimeLink(user: { id: number; email: string; name: string }, kind: LinkKind, actorId: number | null): Promise<void> {
  const token = randomBytes(32).toString('base64url')
  const hours = kind === 'invite' ? INVITE_HOURS : RESET_HOURS
  const link = appUrl(`/set-password?token=${token}`)
  const text =
    kind === 'invite'
      ? `Hello ${user.name},\n\nYou have been invited to Mapwright. Set your password here (the link works once and expires in ${hours} hours):\n\n${link}\n`
      : `Hello ${user.name},\n\nSomeone asked to reset your Mapwright password. If it was you, set a new one here (the link works once and expires in ${hours} hour):\n\n${link}\n\nIf it was not you, ignore this message.\n`
  await createAuthToken({
    userId: user.id,
    kind,
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + hours * 3600_000),
    mail: { to: [user.email], subject: kind === 'invite' ? 'Your Mapwright invitation' : 'Reset your Mapwright password', text },
    actorId,
  })
  nudgeMail()
}

/** Set a password through a one-time link; null when the link is unknown, used or expired. */
export async function usePasswordLink(token: string, password: string): Promise<number | null> {
  return consumeAuthToken(hashToken(token), await hashPassword(password))
}

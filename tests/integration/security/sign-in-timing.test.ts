import { describe, expect, it, vi, beforeEach } from 'vitest'
import { checkCredentials } from '@/app/_lib/auth/credentials'
import { resetLimiter } from '@/app/_lib/auth/sign-in-limiter'
import { updateUser } from '@/db/queries/users'
import { makeUser } from '@/tests/support/api'

// Count the argon2 verifications instead of timing them: the cost of a sign-in is that one verify.
const verify = vi.hoisted(() => ({ calls: [] as string[] }))
vi.mock('@/app/_lib/auth/password', async (importOriginal) => {
  const real = await importOriginal<typeof import('@/app/_lib/auth/password')>()
  return {
    ...real,
    verifyPassword: async (hash: string, password: string) => {
      verify.calls.push(hash)
      return real.verifyPassword(hash, password)
    },
  }
})

describe('sign-in timing', () => {
  beforeEach(async () => {
    await resetLimiter()
    verify.calls.length = 0
  })

  it('an unknown account costs one argon2id verification, like a known one', async () => {
    const user = await makeUser('test_driver', { password: 'known password 1' })
    expect(await checkCredentials(user.email, 'wrong password 1', '192.0.2.1')).toBeNull()
    expect(await checkCredentials('nobody-here@test.example', 'wrong password 1', '192.0.2.1')).toBeNull()
    expect(verify.calls).toHaveLength(2)
    for (const h of verify.calls) expect(h).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/)
  })

  it('a disabled account costs the same and never passes', async () => {
    const user = await makeUser('test_driver', { password: 'known password 2' })
    await updateUser(user.id, { disabled: true })
    expect(await checkCredentials(user.email, 'known password 2', '192.0.2.2')).toBeNull()
    expect(verify.calls).toHaveLength(1)
  })
})

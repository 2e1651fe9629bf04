import 'server-only'
import { hash, verify } from '@node-rs/argon2'

// @node-rs/argon2 defaults to argon2id; these are the OWASP-recommended minimums (19 MiB, t=2, p=1).
const options = { memoryCost: 19_456, timeCost: 2, parallelism: 1 }

export function hashPassword(password: string): Promise<string> {
  return hash(password, options)
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password)
  } catch {
    return false // a malformed stored hash is a failed sign-in, not a crash
  }
}

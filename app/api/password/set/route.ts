import { publicRoute } from '@/app/_lib/http/access'
import { ValidationError } from '@/app/_lib/http/errors'
import { readJson } from '@/app/_lib/http/request'
import { usePasswordLink } from '@/app/_lib/auth/one-time-links'
import { setPasswordSchema } from '@/app/_schemas/user'

// POST /api/password/set — set a password with a one-time invite or reset link
export const POST = publicRoute(async (req) => {
  const { token, password } = await readJson(req, setPasswordSchema)
  const userId = await usePasswordLink(token, password)
  if (!userId) throw new ValidationError('This link has expired or has already been used; ask for a new one')
  return Response.json({ message: 'Password set. You can sign in now.' })
})

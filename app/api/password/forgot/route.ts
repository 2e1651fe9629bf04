import { z } from 'zod'
import { publicRoute } from '@/app/_lib/http/access'
import { readJson } from '@/app/_lib/http/request'
import { sendOneTimeLink } from '@/app/_lib/auth/one-time-links'
import { getUserCredentials } from '@/db/queries/users'

const schema = z.object({ email: z.email('Email must be a valid address') })

// POST /api/password/forgot — e-mail a one-time reset link; answers the same whether or not the account exists
export const POST = publicRoute(async (req) => {
  const { email } = await readJson(req, schema)
  const user = await getUserCredentials(email)
  if (user && !user.disabled) await sendOneTimeLink(user, 'reset', null)
  return Response.json({ message: 'If that address has an account, a reset link is on its way.' })
})

import { publicRoute } from '@/app/_lib/http/access'
import { HttpError } from '@/app/_lib/http/errors'
import { readJson } from '@/app/_lib/http/request'
import { currentRequestContext } from '@/db/request-context'
import { sendOneTimeLink } from '@/app/_lib/auth/one-time-links'
import { RequestLimiter } from '@/app/_lib/auth/request-limiter'
import { getUserCredentials } from '@/db/queries/users'
import { forgotPasswordSchema } from '@/app/_schemas/user'

// Per account: 3 links an hour (counted for unknown addresses too, so a 429 reveals nothing); per address: 10.
// Counted in the database, so the budgets hold across every app server.
const perAccount = new RequestLimiter('forgot-account', 3, 3600_000)
const perAddress = new RequestLimiter('forgot-address', 10, 3600_000)

// POST /api/password/forgot — e-mail a one-time reset link; answers the same whether or not the account exists
export const POST = publicRoute(async (req) => {
  const { email } = await readJson(req, forgotPasswordSchema)
  const ip = currentRequestContext()?.ip
  // Both budgets are asked, address first, whatever the first answers: a request refused by one still
  // counts against the other if that one had room.
  const byAddress = await perAddress.take([`ip:${ip ?? 'unknown'}`])
  const byAccount = await perAccount.take([`account:${email.trim().toLowerCase()}`])
  const wait = Math.max(byAddress, byAccount)
  if (wait > 0) throw new HttpError(429, 'too_many_requests', `Too many reset requests. Try again in ${Math.ceil(wait / 60)} minute(s).`)
  const user = await getUserCredentials(email)
  if (user && !user.disabled) await sendOneTimeLink(user, 'reset', null)
  return Response.json({ message: 'If that address has an account, a reset link is on its way.' })
})

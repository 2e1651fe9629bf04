/**
 * Signing in over HTTP through next-auth's real credentials flow, for tests and benchmarks that talk
 * to a running production server (not to route handlers in-process).
 */

/** `name=value` pairs from Set-Cookie headers, merged into a jar. */
export function mergeCookies(jar: Map<string, string>, res: Response): void {
  for (const c of res.headers.getSetCookie()) {
    const [pair] = c.split(';')
    const eq = pair.indexOf('=')
    if (eq > 0) jar.set(pair.slice(0, eq).trim(), pair.slice(eq + 1).trim())
  }
}
export const cookieHeader = (jar: Map<string, string>) => [...jar].map(([k, v]) => `${k}=${v}`).join('; ')

export interface SignInAttempt {
  ok: boolean
  /** The Cookie header for later calls (session cookie included when ok). */
  cookie: string
  cookies: { name: string; value: string }[]
  /** next-auth's error text when the sign-in was refused (wrong password, or the throttle's message). */
  error: string
}

/** One sign-in attempt; never throws for a refused sign-in, so throttling can be observed. */
export async function trySignIn(baseUrl: string, email: string, password: string): Promise<SignInAttempt> {
  const jar = new Map<string, string>()
  const csrfRes = await fetch(`${baseUrl}/api/auth/csrf`)
  mergeCookies(jar, csrfRes)
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string }
  const res = await fetch(`${baseUrl}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: cookieHeader(jar) },
    body: new URLSearchParams({ csrfToken, email, password, callbackUrl: `${baseUrl}/`, json: 'true' }).toString(),
  })
  mergeCookies(jar, res)
  const ok = [...jar.keys()].some((k) => k.endsWith('next-auth.session-token'))
  // Refused: next-auth answers with (or redirects to) a URL carrying ?error=…
  let where = res.headers.get('location') ?? ''
  if (!where && res.headers.get('content-type')?.includes('json')) where = String(((await res.json()) as { url?: string }).url ?? '')
  const error = ok ? '' : (new URL(where || baseUrl, baseUrl).searchParams.get('error') ?? `status ${res.status}`)
  return { ok, cookie: cookieHeader(jar), cookies: [...jar].map(([name, value]) => ({ name, value })), error }
}

/** Signs in or throws; returns the Cookie header and the cookies as pairs. */
export async function signIn(baseUrl: string, email: string, password: string): Promise<{ cookie: string; cookies: { name: string; value: string }[] }> {
  const a = await trySignIn(baseUrl, email, password)
  if (!a.ok) throw new Error(`sign-in as ${email} failed: ${a.error}`)
  return { cookie: a.cookie, cookies: a.cookies }
}

/** An error from the HTTP API, carrying the server's code, message and details. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message)
  }
}

/**
 * No answer came: the connection failed, dropped or timed out, so the request may or may not have
 * reached the server. `offline`: the browser knew it had no network.
 */
export class NoAnswerError extends Error {
  constructor(readonly offline: boolean) {
    super(offline ? 'You are offline; nothing was sent.' : 'The connection dropped before the server answered; it is not known whether this arrived.')
  }
}

/**
 * A fresh id for a draft, sent as the Idempotency-Key of the request that creates it, so sending
 * the same draft twice creates one thing. crypto.getRandomValues, unlike randomUUID, also works on
 * a plain-http LAN address (not a secure context), where a driver's phone may reach the app.
 */
export function newDraftId(): string {
  const b = crypto.getRandomValues(new Uint8Array(16))
  return `draft-${Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('')}`
}

const isOffline = () => typeof navigator !== 'undefined' && navigator.onLine === false

/**
 * Fetch JSON from the app's own API; non-2xx answers throw ApiError with the server's message, and
 * no answer at all (network failure, `timeoutMs` passed, a body cut off) throws NoAnswerError.
 */
export async function api<T>(url: string, init?: RequestInit & { json?: unknown; timeoutMs?: number }): Promise<T> {
  const { json, timeoutMs, ...rest } = init ?? {}
  // State-changing calls are always JSON, even without a body: the server refuses other types (CSRF defence).
  const sendsJson = json !== undefined || !['GET', 'HEAD', undefined].includes(rest.method?.toUpperCase())
  let res: Response
  try {
    res = await fetch(url, {
      ...rest,
      headers: { ...(sendsJson ? { 'content-type': 'application/json' } : {}), ...rest.headers },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
      signal: rest.signal ?? (timeoutMs ? AbortSignal.timeout(timeoutMs) : undefined),
    })
  } catch {
    throw new NoAnswerError(isOffline())
  }
  let text = ''
  try {
    text = await res.text()
  } catch {
    // A success whose body never fully arrived: the change may well have been made.
    if (res.ok) throw new NoAnswerError(isOffline())
  }
  let body: { error?: { code?: string; message?: string; details?: unknown } } | null = null
  try {
    body = text ? JSON.parse(text) : null
  } catch {
    body = null
  }
  if (!res.ok) {
    const err = body?.error
    throw new ApiError(res.status, err?.code ?? 'http_error', err?.message ?? `Request failed (${res.status})`, err?.details)
  }
  return body as T
}

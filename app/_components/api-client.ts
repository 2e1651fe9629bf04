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

/** Fetch JSON from the app's own API; non-2xx answers throw ApiError with the server's message. */
export async function api<T>(url: string, init?: RequestInit & { json?: unknown }): Promise<T> {
  const { json, ...rest } = init ?? {}
  // State-changing calls are always JSON, even without a body: the server refuses other types (CSRF defence).
  const sendsJson = json !== undefined || !['GET', 'HEAD', undefined].includes(rest.method?.toUpperCase())
  const res = await fetch(url, {
    ...rest,
    headers: { ...(sendsJson ? { 'content-type': 'application/json' } : {}), ...rest.headers },
    body: json !== undefined ? JSON.stringify(json) : rest.body,
  })
  const body = await res.json().catch(() => null)
  if (!res.ok) {
    const err = body?.error
    throw new ApiError(res.status, err?.code ?? 'http_error', err?.message ?? `Request failed (${res.status})`, err?.details)
  }
  return body as T
}

import { AsyncLocalStorage } from 'node:async_hooks'

/** Who is acting and from where, for the audit trail; set once per request by the access wrapper. */
export interface RequestContext {
  ip: string | null
}

const storage = new AsyncLocalStorage<RequestContext>()

export function runWithRequestContext<T>(ctx: RequestContext, fn: () => Promise<T>): Promise<T> {
  return storage.run(ctx, fn)
}

export function currentRequestContext(): RequestContext | undefined {
  return storage.getStore()
}

import { getHandle } from './client'

/**
 * Server-side prepared statements for the hottest reads. PGlite plans a four-table join afresh on
 * every call, and the query builder's SQL generation and row mapping cost more again (measured:
 * 0.35 ms executing a prepared map read against 1.3 ms through the builder). PostgreSQL keeps a
 * prepared statement per connection (node-postgres prepares a named query on each connection the
 * first time); PGlite is one session, prepared once per open database.
 */
type Row = Record<string, unknown>
interface PgPool { query: (q: { name: string; text: string; values: unknown[] }) => Promise<{ rows: Row[] }> }
interface Pglite { exec: (sql: string) => Promise<{ rows: Row[] }[]> }

// On globalThis: Next loads route handlers and pages as separate module copies, which share one
// PGlite session, and a statement can be prepared only once per session.
const registryKey = Symbol.for('mapwright.prepared-statements')
const g = globalThis as typeof globalThis & { [registryKey]?: WeakMap<object, Map<string, Promise<unknown>>> }
const preparedOn = (g[registryKey] ??= new WeakMap())

/** PostgreSQL's "duplicate_prepared_statement": prepared already in this session, which is what we wanted. */
const alreadyPrepared = (e: unknown) => (e as { code?: string } | null)?.code === '42P05'

/** Runs statement `name` (SQL with $1…$n) with integer arguments only, so PGlite's EXECUTE can carry them as literals. */
export async function executePrepared(name: string, text: string, args: number[]): Promise<Row[]> {
  if (!/^[a-z_]+$/.test(name)) throw new Error(`prepared statement name must be lower-case letters and _, got ${name}`)
  for (const a of args) if (!Number.isSafeInteger(a)) throw new TypeError(`prepared statement ${name}: arguments must be integers, got ${a}`)
  const h = await getHandle()
  const client = (h.db as unknown as { $client: unknown }).$client
  if (h.kind === 'postgres') return (await (client as PgPool).query({ name, text, values: args })).rows
  const pg = client as Pglite
  let named = preparedOn.get(pg)
  if (!named) preparedOn.set(pg, (named = new Map()))
  let ready = named.get(name)
  if (!ready) {
    const types = args.length ? ` (${args.map(() => 'bigint').join(', ')})` : ''
    ready = pg.exec(`prepare ${name}${types} as ${text}`).catch((e: unknown) => {
      if (alreadyPrepared(e)) return
      named.delete(name) // a failed prepare is tried again next time
      throw e
    })
    named.set(name, ready)
  }
  await ready
  // The simple protocol (exec): query() sends parse, describe, bind and execute for every call, which
  // made a map read's EXECUTE ≈ 0.23 ms against ≈ 0.15 ms; the rows and their types are the same
  // (tests/integration/revisions/revision-cache.test.ts). The arguments are checked integers, written as literals.
  const [result] = await pg.exec(`execute ${name}${args.length ? ` (${args.join(', ')})` : ''}`)
  return result.rows
}

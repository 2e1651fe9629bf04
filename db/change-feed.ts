/**
 * On PGlite, a count of committed writes, told by the database itself: a trigger on every table of
 * the app's schema sends a notification for each row written (and for a truncate), which PostgreSQL
 * delivers once per transaction, when it commits (never for one rolled back). Row triggers, not
 * statement triggers: a statement that changes no row (the log worker's idle poll) must not count,
 * and a notification gives its transaction an id, which would change the snapshot too. PGlite is one session in this process
 * (the data folder is locked to it), so every write reaches this counter, whichever code ran it —
 * the app, raw SQL, a script in the same process. A cache that saw the count unchanged since its read
 * knows nothing was written since, without asking (db/snapshot-cache.ts).
 *
 * Not used on PostgreSQL: another server's writes would need a listening connection that never drops
 * a notification; there the cache asks for the snapshot every time.
 */
export const CHANGES_CHANNEL = 'mapwright_changes'

export interface ChangeCount {
  /** Writes committed since the feed started. */
  readonly count: number
}

interface Pglite {
  exec: (sql: string) => Promise<{ rows: Record<string, unknown>[] }[]>
  listen: (channel: string, cb: (payload: string) => void) => Promise<unknown>
}

const TRIGGER = 'mapwright_notify_change'

/**
 * Installs the trigger on every table of the public schema (also tables a later migration adds: this
 * runs at every open, after the migrations) and starts listening. Resolves once both are in place.
 */
export async function startChangeFeed(pg: Pglite): Promise<ChangeCount> {
  const feed = { count: 0 }
  await pg.listen(CHANGES_CHANNEL, () => { feed.count++ })
  const [{ rows }] = await pg.exec(`select tablename from pg_tables where schemaname = 'public' order by tablename`)
  const tables = rows.map((r) => String(r.tablename))
  await pg.exec([
    `create or replace function ${TRIGGER}() returns trigger language plpgsql as $$
       begin perform pg_notify('${CHANGES_CHANNEL}', ''); return null; end $$`,
    ...tables.flatMap((t) => {
      const table = `"${t.replaceAll('"', '""')}"`
      return [
        `create or replace trigger ${TRIGGER} after insert or update or delete on ${table} for each row execute function ${TRIGGER}()`,
        `create or replace trigger ${TRIGGER}_truncate after truncate on ${table} for each statement execute function ${TRIGGER}()`,
      ]
    }),
  ].join(';\n'))
  return feed
}

/** Tables of the public schema without the trigger (for tests; empty once the feed runs). */
export async function tablesWithoutChangeTrigger(pg: Pick<Pglite, 'exec'>): Promise<string[]> {
  const [{ rows }] = await pg.exec(`select t.tablename from pg_tables t where t.schemaname = 'public' and not exists (
    select 1 from pg_trigger g join pg_class c on c.oid = g.tgrelid join pg_namespace n on n.oid = c.relnamespace
    where n.nspname = 'public' and c.relname = t.tablename and g.tgname = '${TRIGGER}') order by 1`)
  return rows.map((r) => String(r.tablename))
}

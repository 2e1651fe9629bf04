import { createHash } from 'node:crypto'
import { and, asc, eq, gt, inArray, lt, sql } from 'drizzle-orm'
import { getDb, type Db } from '../client'
import { rateEvents } from '../schema'

/**
 * Events counted for limits every app server must share (failed sign-ins, reset-link requests). All
 * times are the database's (`now()`), never the app server's: servers with skewed clocks still agree
 * on what falls inside a window.
 */

/** Rows older than this are deleted; no window may be longer (a limit would silently count less). */
export const RETENTION_MS = 2 * 3600_000

/**
 * A record deletes the expired rows with this probability. Pruning on every record would make each
 * failed sign-in pay for a range delete; a chance rather than "every N records" needs no counter,
 * which each server would keep for itself, so the fleet prunes at the same rate whatever its size.
 * Expired rows are never counted (every read filters by its window), so late pruning costs only
 * space: about two hours of events plus a hundred or so.
 */
export const PRUNE_CHANCE = 1 / 100

/** Two-key advisory locks in this class are this module's (the one-key form is a separate space). */
const LOCK_CLASS = 0x7261 // "ra"

export interface KeyCount {
  count: number
  /** Age of the oldest event within the window, ms by the database's clock (0 when count is 0). */
  oldestAgeMs: number
}

/**
 * The stored key for a caller's key: scope, then a digest, so the table holds no e-mail address or
 * client address (a password typed into the e-mail field would otherwise sit in it, and in backups).
 */
export function rateKey(scope: string, key: string): string {
  return `${scope}:${createHash('sha256').update(key).digest('base64url').slice(0, 27)}`
}

function assertWindow(windowMs: number): void {
  if (!(windowMs > 0 && windowMs <= RETENTION_MS)) throw new Error(`a rate window must be within 0–${RETENTION_MS} ms, not ${windowMs}`)
}

const inWindow = (windowMs: number) => gt(rateEvents.at, sql`now() - make_interval(secs => ${windowMs / 1000})`)

async function countIn(db: Pick<Db, 'select'>, keys: string[], windowMs: number): Promise<Map<string, KeyCount>> {
  const rows = await db
    .select({
      key: rateEvents.key,
      count: sql<number>`count(*)::int`.mapWith(Number),
      oldestAgeMs: sql<number>`(extract(epoch from now() - min(${rateEvents.at})) * 1000)::float8`.mapWith(Number),
    })
    .from(rateEvents)
    .where(and(inArray(rateEvents.key, keys), inWindow(windowMs)))
    .groupBy(rateEvents.key)
  return new Map(rows.map((r) => [r.key, { count: r.count, oldestAgeMs: Math.max(0, r.oldestAgeMs) }]))
}

const none: KeyCount = { count: 0, oldestAgeMs: 0 }

/** Events per key within the window, in the order of `keys` (stored keys, see rateKey). */
export async function countEvents(keys: string[], windowMs: number): Promise<KeyCount[]> {
  assertWindow(windowMs)
  if (!keys.length) return []
  const found = await countIn(await getDb(), [...new Set(keys)], windowMs)
  return keys.map((k) => found.get(k) ?? none)
}

/** Count one event now for each key. */
export async function recordEvents(keys: string[]): Promise<void> {
  if (!keys.length) return
  const db = await getDb()
  await db.insert(rateEvents).values(keys.map((key) => ({ key })))
  await maybePrune()
}

/**
 * Count one event for each key, but only if every key has fewer than `max` within the window;
 * otherwise count nothing. Returns the counts seen before (so the caller can say how long to wait).
 *
 * Race-free across servers: the check and the insert run in one transaction holding an advisory
 * lock per key, so a second server's take of the same key waits for this one to commit and then
 * counts its row (READ COMMITTED takes a fresh snapshot per statement, after the lock is granted).
 * Without the lock two servers could both count max − 1 and both insert. On PGlite the lock is
 * never contended (one connection, and PGlite runs one transaction at a time), which is the same
 * guarantee, so one code path serves both.
 */
export async function takeEvent(keys: string[], max: number, windowMs: number): Promise<{ taken: boolean; counts: KeyCount[] }> {
  assertWindow(windowMs)
  const unique = [...new Set(keys)].sort() // one lock order everywhere: two takes never deadlock
  if (!unique.length) return { taken: true, counts: [] }
  const db = await getDb()
  const result = await db.transaction(async (tx) => {
    for (const k of unique) await tx.execute(sql`select pg_advisory_xact_lock(${sql.raw(String(LOCK_CLASS))}, hashtext(${k}))`)
    const found = await countIn(tx, unique, windowMs)
    const counts = keys.map((k) => found.get(k) ?? none)
    const taken = counts.every((c) => c.count < max)
    if (taken) await tx.insert(rateEvents).values(unique.map((key) => ({ key })))
    return { taken, counts }
  })
  if (result.taken) await maybePrune()
  return result
}

/** Forget these keys' events (a successful sign-in clears its counts). */
export async function clearEvents(keys: string[]): Promise<void> {
  if (!keys.length) return
  const db = await getDb()
  await db.delete(rateEvents).where(inArray(rateEvents.key, keys))
}

/** Forget every event of a scope (tests). */
export async function clearScope(scope: string): Promise<void> {
  const db = await getDb()
  await db.delete(rateEvents).where(sql`starts_with(${rateEvents.key}, ${`${scope}:`})`)
}

/** Delete the rows older than RETENTION_MS; returns how many. */
export async function pruneRateEvents(): Promise<number> {
  const db = await getDb()
  const gone = await db
    .delete(rateEvents)
    .where(lt(rateEvents.at, sql`now() - make_interval(secs => ${RETENTION_MS / 1000})`))
    .returning({ id: rateEvents.id })
  return gone.length
}

async function maybePrune(): Promise<void> {
  if (Math.random() >= PRUNE_CHANCE) return
  try {
    await pruneRateEvents()
  } catch (e) {
    // Housekeeping: a failed prune must not fail the sign-in or request that happened to run it.
    console.error(`rate_events prune failed: ${e instanceof Error ? e.message : e}`)
  }
}

/** Oldest first: the stored events of one key (tests and diagnostics). */
export async function eventsOf(key: string): Promise<Date[]> {
  const db = await getDb()
  const rows = await db.select({ at: rateEvents.at }).from(rateEvents).where(eq(rateEvents.key, key)).orderBy(asc(rateEvents.at))
  return rows.map((r) => r.at)
}

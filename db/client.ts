import path from 'node:path'
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core'
import * as schema from './schema'
import { lockDataDir } from './lock'
import { startChangeFeed, type ChangeCount } from './change-feed'

export type Db = PgDatabase<PgQueryResultHKT, typeof schema>

interface Handle {
  db: Db
  close: () => Promise<void>
  kind: 'pglite' | 'postgres'
  /** PGlite only: committed writes counted by the database (db/change-feed.ts). */
  changes?: ChangeCount
}

// One instance per process, on globalThis: Next loads route handlers and pages as separate module
// copies, and a module-level singleton would open the same PGlite folder twice.
const globalKey = Symbol.for('mapwright.db')
type GlobalWithDb = typeof globalThis & { [globalKey]?: Promise<Handle> }
const g = globalThis as GlobalWithDb

export const migrationsFolder = path.join(process.cwd(), 'db', 'migrations')

/** Where PGlite keeps its files: PGLITE_DATA_DIR, `memory://` for tests, `.data/pglite` by default. */
export function pgliteDataDir(): string {
  return process.env.PGLITE_DATA_DIR || path.join(process.cwd(), '.data', 'pglite')
}

async function openPglite(): Promise<Handle> {
  const dataDir = pgliteDataDir()
  const inMemory = dataDir.startsWith('memory://')
  const release = inMemory ? () => {} : lockDataDir(dataDir)
  try {
    const { PGlite } = await import('@electric-sql/pglite')
    const { drizzle } = await import('drizzle-orm/pglite')
    const { migrate } = await import('drizzle-orm/pglite/migrator')
    const client = inMemory ? new PGlite() : new PGlite(dataDir)
    await client.waitReady
    const db = drizzle({ client, schema })
    await migrate(db, { migrationsFolder })
    // PGlite has no autovacuum, so its planner never learns table sizes; refresh the statistics once per open.
    await client.exec('analyze')
    const changes = await startChangeFeed(client)
    return {
      db,
      kind: 'pglite',
      changes,
      close: async () => {
        await client.close()
        release()
      },
    }
  } catch (e) {
    release()
    throw e
  }
}

async function openPostgres(url: string): Promise<Handle> {
  const { Pool } = await import('pg')
  const { drizzle } = await import('drizzle-orm/node-postgres')
  const { migrate } = await import('drizzle-orm/node-postgres/migrator')
  const pool = new Pool({ connectionString: url, max: Number(process.env.PG_POOL_MAX ?? 10) })
  // An idle connection the server closes (restart, failover, a dropped database) must not crash the
  // process: the pool drops that client and opens a new one on the next query.
  pool.on('error', (e) => console.error(`PostgreSQL connection lost: ${e.message}`))
  try {
    const db = drizzle({ client: pool, schema })
    await migrate(db, { migrationsFolder })
    return { db, kind: 'postgres', close: () => pool.end() }
  } catch (e) {
    await pool.end()
    throw e
  }
}

function open(): Promise<Handle> {
  const url = process.env.DATABASE_URL
  return url ? openPostgres(url) : openPglite()
}

/** The process's database, opened (and migrated) on first use — never at build time. */
export async function getHandle(): Promise<Handle> {
  if (!g[globalKey]) {
    // A failed open must not be cached, or every later request fails too.
    g[globalKey] = open().catch((e) => {
      g[globalKey] = undefined
      throw e
    })
  }
  return g[globalKey]!
}

export async function getDb(): Promise<Db> {
  return (await getHandle()).db
}

/** Close the process's database (tests, scripts, shutdown). */
export async function closeDb(): Promise<void> {
  const p = g[globalKey]
  g[globalKey] = undefined
  if (p) await (await p).close()
}

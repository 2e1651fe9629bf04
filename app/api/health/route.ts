import { sql } from 'drizzle-orm'
import { publicRoute } from '@/app/_lib/http/access'
import { storageAnswers } from '@/app/_lib/storage/object-store'
import { getDb } from '@/db/client'

/** A check that gives up after `ms`, so a hung dependency makes the answer 503 rather than a hung probe. */
async function probe(check: () => Promise<unknown>, ms = 3000): Promise<'ok' | string> {
  let timer: NodeJS.Timeout | undefined
  try {
    await Promise.race([check(), new Promise((_, reject) => (timer = setTimeout(() => reject(new Error(`no answer within ${ms} ms`)), ms)))])
    return 'ok'
  } catch (e) {
    return e instanceof Error ? e.message.slice(0, 200) : 'failed'
  } finally {
    clearTimeout(timer)
  }
}

// GET /api/health — for a load balancer: 200 when the database and the object store answer, else 503 naming what did not
export const GET = publicRoute(async () => {
  const [database, storage] = await Promise.all([probe(async () => (await getDb()).execute(sql`select 1`)), probe(storageAnswers)])
  const ok = database === 'ok' && storage === 'ok'
  return Response.json({ status: ok ? 'ok' : 'unavailable', database, storage }, { status: ok ? 200 : 503, headers: { 'cache-control': 'no-store' } })
})

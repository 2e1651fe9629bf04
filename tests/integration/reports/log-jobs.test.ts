// A drive log's analysis is a job any server can finish: claimed from the database with a lease,
// kept alive by the progress writes, written only by the claim's holder, released on stop.
// Every test leaves no log waiting, so the next one's workers see only its own logs.
import { Readable } from 'node:stream'
import { afterEach, beforeAll, describe, expect, it } from 'vitest'
import { eq, sql } from 'drizzle-orm'
import * as logsRoute from '@/app/api/reports/[id]/logs/route'
import * as logRoute from '@/app/api/reports/[id]/logs/[logId]/route'
import { runClaimedAnalysis, type JobOutcome } from '@/app/_lib/reports/log-jobs'
import { LogWorker, startLogWorker, stopLogWorker } from '@/app/_lib/reports/log-worker'
import { putObjectStream } from '@/app/_lib/storage/object-store'
import { getDb } from '@/db/client'
import { claimNextLog, createLog, extendLogLease, finishClaimedLog, getLog, getLogJob, releaseLog, type LogClaim } from '@/db/queries/logs'
import { driveLogs } from '@/db/schema'
import { call } from '@/tests/support/api'
import { generateLog, generateLogChunks } from '@/tests/support/log-generator'
import { filedReport } from '@/tests/support/report-fixtures'

const LEASE = 30_000
const CSV = generateLog({ seed: 5, durationS: 60, rateHz: 20 }).csv

let report: Awaited<ReturnType<typeof filedReport>>
beforeAll(async () => {
  report = await filedReport()
})

let n = 0
/** A log stored and recorded as the upload route does, 'uploaded'; `big` is an hour at 20 Hz, about 4 MB. */
async function storedLog(big = false) {
  const objectKey = `logs/report-${report.reportId}/jobs-${++n}.csv`
  let sizeBytes = 0
  const source = big ? generateLogChunks({ seed: 9, durationS: 3600, rateHz: 20 }) : [Buffer.from(CSV)]
  const body = Readable.from(
    (async function* () {
      for await (const chunk of source) {
        sizeBytes += chunk.length
        yield chunk
      }
    })(),
  )
  await putObjectStream(objectKey, body, 'text/csv')
  return createLog({ reportId: report.reportId, objectKey, fileName: `jobs-${n}.csv`, sizeBytes, mapping: {} })
}

/** As a server leaves a log it was analysing: its claim, a lease ending `leaseFromNow` from now (negative: over), its attempts. */
async function leftAnalysing(id: number, claimedBy: string, leaseFromNow: string, attempts: number) {
  const db = await getDb()
  await db
    .update(driveLogs)
    .set({ status: 'analysing', claimedBy, leaseUntil: sql`now() + ${leaseFromNow}::interval`, attempts })
    .where(eq(driveLogs.id, id))
}

async function settled(id: number) {
  for (let i = 0; i < 400; i++) {
    const log = await getLog(id)
    if (log && (log.status === 'done' || log.status === 'failed')) return log
    await new Promise((r) => setTimeout(r, 25))
  }
  throw new Error(`log ${id} did not settle`)
}

/**
 * Until the workers have reported `n` outcomes: a job writes its log's final status before it tells
 * the worker, so a settled log may not be in the outcomes yet (seen once on PostgreSQL: 5 of 6).
 */
async function reported<T>(outcomes: () => T[], n: number): Promise<T[]> {
  for (let i = 0; i < 400 && outcomes().length < n; i++) await new Promise((r) => setTimeout(r, 25))
  return outcomes()
}

/** Workers made by a test, stopped after it whatever happened. */
const workers: LogWorker[] = []
function worker(over: ConstructorParameters<typeof LogWorker>[0] = {}) {
  const outcomes: { logId: number; ended: JobOutcome['ended'] }[] = []
  const w = new LogWorker({ pollMs: 50, heartbeatMs: 0, ...over, onOutcome: (c, o) => outcomes.push({ logId: c.logId, ended: o.ended }) })
  workers.push(w)
  return { w, outcomes }
}
afterEach(async () => {
  await Promise.all(workers.splice(0).map((w) => w.stop({ graceMs: 0 })))
  await stopLogWorker({ graceMs: 0 })
})

describe('drive-log analysis jobs', () => {
  it('a log left analysing by a server that died (its lease over) is claimed and finished by a worker', async () => {
    const log = await storedLog()
    await leftAnalysing(log.id, 'dead-server:1#1', '-1 minute', 1)
    const { w, outcomes } = worker()
    w.start()
    const done = await settled(log.id)
    expect(done.status).toBe('done')
    expect((done.analysis as { samples: number } | null)?.samples).toBe(60 * 20 + 1)
    const job = await getLogJob(log.id)
    expect(job).toMatchObject({ status: 'done', attempts: 2, leaseUntil: null })
    expect(job?.claimedBy?.startsWith(`${w.id}#`)).toBe(true)
    expect(await reported(() => outcomes, 1)).toEqual([{ logId: log.id, ended: 'done' }])
  })

  it('a live lease is not taken over', async () => {
    const log = await storedLog()
    await leftAnalysing(log.id, 'other-server:2#1', '5 minutes', 1)
    expect(await claimNextLog('probe#1', LEASE, 3)).toBeNull()
    const { w } = worker()
    w.start()
    await w.fill()
    expect(w.running).toBe(0)
    expect(await getLogJob(log.id)).toMatchObject({ status: 'analysing', claimedBy: 'other-server:2#1', attempts: 1, leaseLive: true })
    // Left as it is: its lease outlives this file, so no later test sees it waiting.
  })

  it('servers claiming at once each get a different log, and each log is analysed once', async () => {
    const logs = await Promise.all(Array.from({ length: 6 }, () => storedLog()))
    const ids = logs.map((l) => l.id).sort((a, b) => a - b)
    // Ten claims at once (concurrent transactions on PostgreSQL): six logs, six claims, no log twice.
    const claims = await Promise.all(Array.from({ length: 10 }, (_, i) => claimNextLog(`racer-${i}#1`, LEASE, 3)))
    const got = claims.filter((c): c is LogClaim => c !== null)
    expect(got.map((c) => c.logId).sort((a, b) => a - b)).toEqual(ids)
    expect(got.every((c) => c.attempts === 1)).toBe(true)
    // Handed back (a hand-back is not an interruption), then two workers take them all at once.
    expect(await Promise.all(got.map((c) => releaseLog(c)))).toEqual(got.map(() => true))
    const a = worker()
    const b = worker()
    a.w.start()
    b.w.start()
    for (const id of ids) expect((await settled(id)).status).toBe('done')
    const outcomes = await reported(() => [...a.outcomes, ...b.outcomes], ids.length)
    expect(outcomes.map((o) => o.logId).sort((x, y) => x - y)).toEqual(ids)
    expect(outcomes.every((o) => o.ended === 'done')).toBe(true)
    for (const id of ids) expect((await getLogJob(id))?.attempts).toBe(1)
  })

  it('a worker whose lease was taken over cannot write its result', async () => {
    const log = await storedLog()
    const first = (await claimNextLog('server-a:1#1', LEASE, 3))!
    expect(first).toMatchObject({ logId: log.id, attempts: 1 })
    // Server A stalls past its lease; server B takes the log over.
    const db = await getDb()
    await db.update(driveLogs).set({ leaseUntil: sql`now() - interval '1 second'` }).where(eq(driveLogs.id, log.id))
    const second = (await claimNextLog('server-b:1#1', LEASE, 3))!
    expect(second).toMatchObject({ logId: log.id, attempts: 2 })

    // A runs on to the end: nothing it writes lands.
    expect(await runClaimedAnalysis(first, { heartbeatMs: 0 })).toEqual({ ended: 'lost' })
    expect(await extendLogLease(first, LEASE, 10)).toBe(false)
    expect(await finishClaimedLog(first, { status: 'failed', errorMessage: 'stale' })).toBe(false)
    expect(await getLog(log.id)).toMatchObject({ status: 'analysing', analysis: null, errorMessage: null })
    expect(await getLogJob(log.id)).toMatchObject({ claimedBy: 'server-b:1#1', leaseLive: true })

    // B's heartbeat and result do.
    expect(await extendLogLease(second, LEASE, 10)).toBe(true)
    expect(await runClaimedAnalysis(second)).toEqual({ ended: 'done' })
    expect((await getLog(log.id))?.status).toBe('done')
  })

  it('a stopping worker releases the log it holds, and another server finishes it at once', async () => {
    const log = await storedLog(true)
    const a = worker({ pollMs: 60_000 })
    a.w.start()
    await a.w.fill()
    expect(a.w.running).toBe(1)
    await a.w.stop({ graceMs: 0 })
    expect(a.outcomes).toEqual([{ logId: log.id, ended: 'stopped' }])
    // Lease over now, no holder, and the hand-back not counted as an interruption.
    expect(await getLogJob(log.id)).toMatchObject({ status: 'analysing', claimedBy: null, attempts: 0, leaseLive: false })

    const b = worker({ pollMs: 60_000 })
    b.w.start()
    const done = await settled(log.id)
    expect(done.status).toBe('done')
    expect(done.progressBytes).toBe(log.sizeBytes)
    expect((await getLogJob(log.id))?.claimedBy?.startsWith(`${b.w.id}#`)).toBe(true)
  })

  it('a log interrupted three times is failed with a message saying so; asking again starts afresh', async () => {
    const log = await storedLog()
    await leftAnalysing(log.id, 'dead-server:3#3', '-10 seconds', 3)
    expect(await claimNextLog('probe#2', LEASE, 3)).toBeNull()
    const failed = await getLog(log.id)
    expect(failed).toMatchObject({ status: 'failed', errorMessage: 'The analysis was interrupted 3 times (a server stopped while it ran); the file is kept; run the analysis again' })

    const again = await call(logRoute.POST, { method: 'POST', cookie: report.driverCookie, params: { id: String(report.reportId), logId: String(log.id) } })
    expect(again.status).toBe(202)
    expect(again.body.log).toMatchObject({ id: log.id, status: 'uploaded', errorMessage: null })
    const { w } = worker()
    w.start()
    expect((await settled(log.id)).status).toBe('done')
    expect((await getLogJob(log.id))?.attempts).toBe(1)
  })

  it('an upload is answered "uploaded" and analysed by this process’s worker, nudged at once', async () => {
    // Polling once a minute: only the upload's nudge can make it look in time.
    startLogWorker({ pollMs: 60_000, heartbeatMs: 0 })
    await new Promise((r) => setTimeout(r, 50)) // its first look, at start, finds nothing
    const req = new Request(`http://127.0.0.1/api/reports/${report.reportId}/logs?name=nudged.csv`, { method: 'POST', headers: { cookie: report.driverCookie, 'content-type': 'text/csv' }, body: CSV, duplex: 'half' } as RequestInit)
    const res = await logsRoute.POST(req, { params: Promise.resolve({ id: String(report.reportId) }) })
    expect(res.status).toBe(201)
    const { log } = await res.json()
    expect(log.status).toBe('uploaded')
    const t0 = Date.now()
    expect((await settled(log.id)).status).toBe('done')
    expect(Date.now() - t0).toBeLessThan(10_000)
  })
})

// The drive-log worker: each server process runs one (started by instrumentation.ts), which claims
// logs waiting for analysis from the database with a lease and analyses them, one or two at a time.
// Any server may finish a log another took the upload of, or one whose server died mid-analysis.
import 'server-only'
import { hostname } from 'node:os'
import { randomUUID } from 'node:crypto'
import { claimNextLog, releaseLog, type LogClaim } from '@/db/queries/logs'
import { LOG_LEASE_MS, LOG_MAX_ATTEMPTS, LOG_WORKER_KEY, runClaimedAnalysis, type JobOutcome } from './log-jobs'

export interface LogWorkerOptions {
  /** Names this worker in `claimed_by`; default host:pid:random. */
  id?: string
  /** Analyses run at once. Default 2. */
  concurrency?: number
  /** How often to look for waiting logs when not nudged. Default 2 s. */
  pollMs?: number
  /** How long a claim lasts without a heartbeat. Default {@link LOG_LEASE_MS}. */
  leaseMs?: number
  /** Leases of one log that may run out before it is failed. Default {@link LOG_MAX_ATTEMPTS}. */
  maxAttempts?: number
  /** Least time between progress writes (heartbeats). Default 1 s; tests set 0. */
  heartbeatMs?: number
  /** Told how each claimed analysis ended (tests, diagnostics). */
  onOutcome?: (claim: LogClaim, outcome: JobOutcome) => void
}

interface Job {
  claim: LogClaim
  /** Set when the worker stops and the grace period is over: the analysis stops at its next progress write. */
  stop: boolean
  done: Promise<JobOutcome>
}

/** A timer that never keeps the process alive (Node's timers have unref; the DOM typing does not say so). */
const unref = (t: ReturnType<typeof setTimeout>) => (t as { unref?: () => void }).unref?.()

/** `p`, or undefined after `ms`, whichever comes first (the timer never keeps the process alive). */
async function within<T>(p: Promise<T>, ms: number): Promise<T | undefined> {
  let timer: ReturnType<typeof setTimeout> | undefined
  const late = new Promise<undefined>((resolve) => {
    const t = setTimeout(() => resolve(undefined), ms)
    unref(t)
    timer = t
  })
  try {
    return await Promise.race([p, late])
  } finally {
    clearTimeout(timer)
  }
}

export class LogWorker {
  readonly id: string
  private readonly concurrency: number
  private readonly pollMs: number
  private readonly leaseMs: number
  private readonly maxAttempts: number
  private readonly heartbeatMs: number | undefined
  private readonly onOutcome: LogWorkerOptions['onOutcome']
  private readonly jobs = new Set<Job>()
  private claims = 0
  private state: 'new' | 'running' | 'stopping' | 'stopped' = 'new'
  private timer: ReturnType<typeof setTimeout> | undefined
  private filling: Promise<void> | null = null
  private again = false
  private stopped: Promise<void> | null = null
  private lastError = ''

  constructor(opts: LogWorkerOptions = {}) {
    this.id = opts.id ?? `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`
    this.concurrency = Math.max(1, opts.concurrency ?? 2)
    this.pollMs = opts.pollMs ?? 2000
    this.leaseMs = opts.leaseMs ?? LOG_LEASE_MS
    this.maxAttempts = opts.maxAttempts ?? LOG_MAX_ATTEMPTS
    this.heartbeatMs = opts.heartbeatMs
    this.onOutcome = opts.onOutcome
  }

  /** Analyses this worker is running now. */
  get running(): number {
    return this.jobs.size
  }

  /** Start polling; the first look is at once (a server that died may have left logs behind). */
  start(): this {
    if (this.state === 'new') {
      this.state = 'running'
      void this.fill()
    }
    return this
  }

  /** A log is waiting (an upload or a re-analysis in this process): look now, not at the next poll. */
  nudge(): void {
    if (this.state === 'running') void this.fill()
  }

  /**
   * Claim waiting logs into the free slots and start their analyses; resolves once no more can be
   * claimed right now (all slots busy, or nothing waits). A call while one runs makes it look again.
   */
  fill(): Promise<void> {
    if (this.filling) {
      this.again = true
      return this.filling
    }
    const claimAll = async () => {
      try {
        do {
          this.again = false
          while (this.state === 'running' && this.jobs.size < this.concurrency) {
            const claim = await claimNextLog(`${this.id}#${++this.claims}`, this.leaseMs, this.maxAttempts)
            if (!claim) break
            this.run(claim)
          }
        } while (this.again && this.state === 'running')
        this.lastError = ''
      } catch (e) {
        // The database is unreachable, say: say so once, and try again at the next poll.
        const message = e instanceof Error ? e.message : String(e)
        if (message !== this.lastError) console.error(`log worker ${this.id}: cannot claim logs: ${message}`)
        this.lastError = message
      }
    }
    // Cleared in a callback, which runs after this assignment even when nothing was awaited (all slots busy).
    this.filling = claimAll().finally(() => {
      this.filling = null
      this.schedule()
    })
    return this.filling
  }

  private schedule() {
    clearTimeout(this.timer)
    if (this.state !== 'running') return
    this.timer = setTimeout(() => void this.fill(), this.pollMs)
    unref(this.timer) // the HTTP server keeps a server process alive, not the worker
  }

  private run(claim: LogClaim) {
    const job: Job = { claim, stop: false, done: Promise.resolve({ ended: 'stopped' }) }
    job.done = runClaimedAnalysis(claim, { leaseMs: this.leaseMs, heartbeatMs: this.heartbeatMs, shouldStop: () => job.stop }).then(async (outcome) => {
      if (outcome.ended === 'stopped') await releaseLog(claim).catch((e) => console.error(`log ${claim.logId}: lease not released`, e))
      if (outcome.ended === 'lost') console.warn(`log ${claim.logId}: ${this.id} no longer held it (its lease was taken over, or the log was asked for again or removed); its result was not written`)
      this.onOutcome?.(claim, outcome)
      return outcome
    })
    this.jobs.add(job)
    void job.done.finally(() => {
      this.jobs.delete(job)
      // A slot is free: take the next waiting log, if any.
      if (this.state === 'running') void this.fill()
    })
  }

  /**
   * Stop: claim nothing more, let running analyses finish for up to `graceMs`, then stop the rest at
   * their next progress write and release their leases (lease_until = now()), so another server
   * takes them over at once. The same promise for every call.
   */
  stop(opts: { graceMs?: number } = {}): Promise<void> {
    if (this.stopped) return this.stopped
    const graceMs = opts.graceMs ?? 10_000
    this.state = 'stopping'
    clearTimeout(this.timer)
    this.stopped = (async () => {
      await this.filling
      const jobs = [...this.jobs]
      await within(Promise.allSettled(jobs.map((j) => j.done)), graceMs)
      const left = jobs.filter((j) => this.jobs.has(j))
      for (const j of left) j.stop = true
      // Each releases its own lease when it sees the stop; one stuck in a read is released from here.
      await within(Promise.allSettled(left.map((j) => j.done)), 2000)
      await Promise.allSettled(left.filter((j) => this.jobs.has(j)).map((j) => releaseLog(j.claim)))
      this.state = 'stopped'
      const g = globalThis as { [LOG_WORKER_KEY]?: LogWorker }
      if (g[LOG_WORKER_KEY] === this) delete g[LOG_WORKER_KEY]
    })()
    return this.stopped
  }
}

/** This process's worker, if one runs. */
export function currentLogWorker(): LogWorker | undefined {
  return (globalThis as { [LOG_WORKER_KEY]?: LogWorker })[LOG_WORKER_KEY]
}

/** Start this process's worker (once; a second call returns the running one). Routes reach it with nudgeLogWorker(). */
export function startLogWorker(opts: LogWorkerOptions = {}): LogWorker {
  const g = globalThis as { [LOG_WORKER_KEY]?: LogWorker }
  g[LOG_WORKER_KEY] ??= new LogWorker(opts).start()
  return g[LOG_WORKER_KEY]
}

/** Stop this process's worker, if one runs: see {@link LogWorker.stop}. */
export async function stopLogWorker(opts: { graceMs?: number } = {}): Promise<void> {
  await currentLogWorker()?.stop(opts)
}

// Runs once when a Next.js server process starts (scripts/server.mjs, next start, next dev): the
// drive-log worker, which claims uploaded logs from the database and analyses them
// (app/_lib/reports/log-worker.ts), stopped on SIGTERM/SIGINT so it finishes or releases what it holds.
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return
  // next build loads the server code to prerender pages: it must never claim logs or open the
  // database (Next skips register() during a build already; this says so here too).
  if (process.env.NEXT_PHASE === 'phase-production-build') return
  const { currentLogWorker, startLogWorker, stopLogWorker } = await import('./app/_lib/reports/log-worker')
  const { env } = await import('./app/_lib/config/env')
  const concurrency = env().LOG_ANALYSIS_CONCURRENCY
  if (concurrency === 0 || currentLogWorker()) return
  startLogWorker({ concurrency })
  for (const signal of ['SIGTERM', 'SIGINT'] as const) {
    process.once(signal, () => {
      void stopLogWorker().finally(() => {
        // scripts/server.mjs and Next's own servers handle the signal too and exit when done; with
        // nobody else listening, end the process as the signal would have.
        if (process.listenerCount(signal) === 0) process.kill(process.pid, signal)
      })
    })
  }
}

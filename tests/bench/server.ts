/**
 * The production server for the API and editor benchmarks: builds if stale, then runs
 * scripts/e2e-server.mjs (fresh demo database, fake S3, mail capture) on a free 127.0.0.1 port as a
 * child process group, and signs in through the real next-auth credentials flow.
 */
import { spawn, type ChildProcess } from 'node:child_process'
import fs from 'node:fs'
import path from 'node:path'
import { DIST_DIR, ROOT } from './report'
import { signIn as signInAs } from '../support/sign-in'
import { freePort } from '../support/free-port'

export const DEMO_EMAIL = 'calib@brackwater.example'
export const DEMO_PASSWORD = 'mapwright-demo'

export interface BenchServer { baseUrl: string; stop: () => Promise<void> }

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms))

/** Pids of `next build` processes running in this tree (another session may be building). */
function buildsInProgress(): number[] {
  const out: number[] = []
  for (const d of fs.readdirSync('/proc')) {
    if (!/^\d+$/.test(d) || Number(d) === process.pid) continue
    try {
      const cmd = fs.readFileSync(`/proc/${d}/cmdline`, 'utf8')
      if (!/next(-build| build)/.test(cmd.replace(/\0/g, ' '))) continue
      if (fs.realpathSync(`/proc/${d}/cwd`) === fs.realpathSync(ROOT)) out.push(Number(d))
    } catch { /* process gone or not ours to read */ }
  }
  return out
}

/** Waits (up to 10 min) until no `next build` runs in this tree and a build is present. */
async function waitForQuietBuild(): Promise<void> {
  const hasBuild = () => fs.existsSync(path.join(DIST_DIR, 'BUILD_ID'))
  for (let waited = 0; (buildsInProgress().length > 0 || (waited > 0 && !hasBuild())) && waited < 600_000; waited += 2000) await sleep(2000)
}

/** Runs buildIfStale from scripts/lib.mjs in a child, after any build already running here has ended. */
async function buildIfStale(): Promise<void> {
  await waitForQuietBuild()
  const code = await new Promise<number>((resolve, reject) => {
    const c = spawn(process.execPath, ['-e', "import('./scripts/lib.mjs').then(m=>m.buildIfStale())"], { cwd: ROOT, stdio: ['ignore', 'inherit', 'inherit'] })
    c.on('error', reject)
    c.on('exit', (code) => resolve(code ?? 1))
  })
  if (code !== 0) throw new Error(`build failed (exit ${code})`)
}

function killGroup(child: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null || !child.pid) return resolve()
    const pid = child.pid
    const done = setTimeout(() => { try { process.kill(-pid, 'SIGKILL') } catch { /* gone */ } resolve() }, 5000)
    child.once('exit', () => { clearTimeout(done); resolve() })
    try { process.kill(-pid, 'SIGTERM') } catch { clearTimeout(done); resolve() }
  })
}

/**
 * Starts the server and waits until it answers; the caller must call stop() (also on error). Other
 * sessions rebuild this tree when sources change, so a start that loses its build is retried.
 */
export async function startServer(opts: { build?: boolean } = {}): Promise<BenchServer> {
  for (let attempt = 1; ; attempt++) {
    if (opts.build !== false) await buildIfStale()
    else await waitForQuietBuild()
    try { return await startOnce() } catch (e) {
      if (attempt >= 3) throw e
      console.error(`server start failed (attempt ${attempt}), retrying: ${e instanceof Error ? e.message.split('\n')[0] : String(e)}`)
    }
  }
}

async function startOnce(): Promise<BenchServer> {
  const port = await freePort()
  const baseUrl = `http://127.0.0.1:${port}`
  const log: string[] = []
  const child = spawn(process.execPath, [path.join(ROOT, 'scripts/e2e-server.mjs'), String(port)], {
    cwd: ROOT,
    detached: true, // own process group: stop() ends the seed, next start and the stand-ins together
    stdio: ['ignore', 'pipe', 'pipe'],
  })
  const keep = (b: Buffer) => { log.push(b.toString()); if (log.length > 200) log.shift() }
  child.stdout?.on('data', keep)
  child.stderr?.on('data', keep)
  const cleanup = () => { if (child.pid) try { process.kill(-child.pid, 'SIGKILL') } catch { /* gone */ } }
  process.once('exit', cleanup)
  const stop = async () => { process.off('exit', cleanup); await killGroup(child) }
  try {
    const deadline = Date.now() + 240_000
    for (;;) {
      if (child.exitCode !== null) throw new Error(`server exited (${child.exitCode}):\n${log.join('')}`)
      if (Date.now() > deadline) throw new Error(`server did not answer on ${baseUrl} within 240 s:\n${log.join('')}`)
      try {
        const r = await fetch(`${baseUrl}/api/auth/csrf`)
        if (r.ok) break
      } catch { /* not listening yet */ }
      await sleep(500)
    }
    return { baseUrl, stop }
  } catch (e) {
    await stop()
    throw e
  }
}

/** Signs in through next-auth's credentials flow (as the demo calibration engineer unless told). */
export function signIn(baseUrl: string, email = DEMO_EMAIL, password = DEMO_PASSWORD): Promise<{ cookie: string; cookies: { name: string; value: string }[] }> {
  return signInAs(baseUrl, email, password)
}

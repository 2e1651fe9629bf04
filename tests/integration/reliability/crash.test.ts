// Crash safety of the production server on a file-backed PGlite folder: sign in as the demo engineer,
// send a burst of saves (three writers, each on its own map with the right parent), SIGKILL the server
// in the middle of it, start it again on the same folder, and check that every acknowledged save is
// there, the history has no holes, the stale lock was taken over, and the database takes writes again.
// PGlite-only (the PostgreSQL pass skips it): a PostgreSQL server has its own crash recovery.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process'
import fs from 'node:fs'
import net from 'node:net'
import os from 'node:os'
import path from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'
import { startFakeS3, startMailCapture, S3_DEFAULTS } from '../../../scripts/local-services.mjs'

const root = process.cwd()
const bin = (name: string) => path.join(root, 'node_modules', '.bin', name)
const DEMO = { email: 'calib@brackwater.example', password: 'mapwright-demo' }
const WRITERS = 3
/** Kill once this many saves are acknowledged, while the writers still have requests in flight. */
const KILL_AFTER_ACKS = 18

interface Ack { mapId: number; number: number; checksum: string; message: string }

/** buildIfStale from scripts/lib.mjs, in a child (it exits on failure); retried while another build holds the lock. */
async function ensureBuilt(): Promise<void> {
  for (let attempt = 0; attempt < 20; attempt++) {
    const r = spawnSync(process.execPath, ['--input-type=module', '-e', "const m = await import('./scripts/lib.mjs'); await m.buildIfStale()"], { cwd: root, encoding: 'utf8', timeout: 600_000 })
    if (r.status === 0) return
    const out = `${r.stdout}\n${r.stderr}`
    if (!/Another next build process is already running/i.test(out)) throw new Error(`next build failed:\n${out.slice(-3000)}`)
    await new Promise((res) => setTimeout(res, 15_000)) // someone else is building this tree: wait for theirs
  }
  throw new Error('next build: another build kept running for 5 minutes')
}

/** Run a command to its end without blocking the event loop; resolves with its exit code and output. */
function runAsync(cmd: string, args: string[], env: NodeJS.ProcessEnv): Promise<{ code: number | null; output: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'] })
    let output = ''
    child.stdout.on('data', (d: Buffer) => (output += d))
    child.stderr.on('data', (d: Buffer) => (output += d))
    child.on('error', reject)
    child.on('exit', (code) => resolve({ code, output }))
  })
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer()
    s.once('error', reject)
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo
      s.close(() => resolve(port))
    })
  })
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0)
    return true
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM'
  }
}

interface Server { child: ChildProcess; exited: Promise<void> }

/** The production server (scripts/server.mjs) in its own process group, so one signal reaches it and anything it forks. */
function startServer(env: NodeJS.ProcessEnv, port: number): Server {
  const child = spawn(process.execPath, ['scripts/server.mjs', '-H', '127.0.0.1', '-p', String(port)], { cwd: root, env, detached: true, stdio: ['ignore', 'pipe', 'pipe'] })
  // Listen for the exit now: a killed server may be gone before anyone awaits it.
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()))
  child.stdout?.on('data', () => {}) // drain, or a chatty server blocks on a full pipe
  child.stderr?.on('data', (d: Buffer) => process.env.CRASH_TEST_VERBOSE && process.stderr.write(d))
  running.push(child)
  return { child, exited }
}

function within<T>(p: Promise<T>, ms: number, what: string): Promise<T> {
  return Promise.race([p, new Promise<T>((_, reject) => setTimeout(() => reject(new Error(`${what}: no end after ${ms / 1000} s`)), ms).unref())])
}

async function waitReady(base: string, child: ChildProcess): Promise<void> {
  const until = Date.now() + 120_000
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`server exited with ${child.exitCode}`)
    try {
      const r = await fetch(`${base}/api/auth/csrf`)
      if (r.ok) return
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 250))
  }
  throw new Error('server did not answer within 120 s')
}

function killGroup(child: ChildProcess, signal: NodeJS.Signals): void {
  try {
    process.kill(-child.pid!, signal)
  } catch {
    /* already gone */
  }
}

/** Cookie jar of one browser: name=value pairs from Set-Cookie. */
class Jar {
  private cookies = new Map<string, string>()
  take(res: Response): void {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';')
      const i = pair.indexOf('=')
      this.cookies.set(pair.slice(0, i).trim(), pair.slice(i + 1))
    }
  }
  header(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ')
  }
  has(name: string): boolean {
    return this.cookies.has(name)
  }
}

/** next-auth's credentials flow, as the sign-in form does it. */
async function signIn(base: string): Promise<Jar> {
  const jar = new Jar()
  const csrf = await fetch(`${base}/api/auth/csrf`)
  jar.take(csrf)
  const { csrfToken } = (await csrf.json()) as { csrfToken: string }
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: jar.header() },
    body: new URLSearchParams({ csrfToken, email: DEMO.email, password: DEMO.password, json: 'true', callbackUrl: `${base}/` }),
  })
  jar.take(res)
  if (!jar.has('next-auth.session-token')) throw new Error(`sign-in failed: ${res.status} ${await res.text()}`)
  return jar
}

async function api<T>(base: string, jar: Jar, p: string, init: RequestInit = {}): Promise<{ status: number; body: T }> {
  const res = await fetch(`${base}${p}`, { ...init, headers: { 'content-type': 'application/json', cookie: jar.header(), ...init.headers } })
  const text = await res.text()
  return { status: res.status, body: (text ? JSON.parse(text) : null) as T }
}

type Table = { kind: string; rowAxis: number[]; colAxis: number[]; values: number[][] }
type RevisionRow = { number: number; checksum: string; message: string }

const work = fs.mkdtempSync(path.join(os.tmpdir(), 'mw-crash-'))
const running: ChildProcess[] = []
const closers: (() => Promise<unknown>)[] = []
afterAll(async () => {
  for (const c of running) killGroup(c, 'SIGKILL')
  await Promise.all(closers.map((c) => c()))
  fs.rmSync(work, { recursive: true, force: true })
})

describe.skipIf(Boolean(process.env.TEST_DATABASE_URL))('crash safety of the production server on PGlite', () => {
  it('every save acknowledged before a SIGKILL is there after a restart; the stale lock is taken over', async () => {
    await ensureBuilt()
    const s3 = await startFakeS3(path.join(work, 's3'), 0)
    const smtp = await startMailCapture(path.join(work, 'outbox.jsonl'), 0)
    closers.push(s3.close, smtp.close)
    const port = await freePort()
    const base = `http://127.0.0.1:${port}`
    const dataDir = path.join(work, 'pglite')
    const env: NodeJS.ProcessEnv = {
      ...process.env,
      NODE_ENV: 'production',
      PGLITE_DATA_DIR: dataDir,
      NEXTAUTH_SECRET: 'crash-test-secret-0123456789abcdef',
      NEXTAUTH_URL: base,
      S3_ENDPOINT: s3.url, S3_BUCKET: S3_DEFAULTS.bucket, S3_ACCESS_KEY_ID: S3_DEFAULTS.accessKeyId, S3_SECRET_ACCESS_KEY: S3_DEFAULTS.secretAccessKey, S3_FORCE_PATH_STYLE: '1',
      SMTP_URL: smtp.url, MAIL_OUTBOX_FILE: path.join(work, 'outbox.jsonl'),
    }
    delete env.DATABASE_URL
    // Not spawnSync: the fake S3 and mail servers the seed talks to run on this process's event loop.
    const seeded = await runAsync(bin('tsx'), ['--conditions=react-server', 'scripts/seed.ts'], { ...env, NODE_ENV: 'development' })
    expect(seeded.code, seeded.output).toBe(0)

    // First life: sign in and find one map per writer.
    const first = startServer(env, port)
    await waitReady(base, first.child)
    const jar = await signIn(base)
    // The database opens on first use (signing in), and its lock file then names the server.
    const lockFile = path.join(dataDir, 'mapwright.lock')
    const firstHolder = Number(fs.readFileSync(lockFile, 'utf8'))
    const maps = (await api<{ maps: { id: number }[] }>(base, jar, '/api/maps')).body.maps.slice(0, WRITERS)
    expect(maps).toHaveLength(WRITERS)

    const acks: Ack[] = []
    const statuses: Record<string, number> = {}
    let killed = false
    let resolveKill: () => void = () => {}
    const killedNow = new Promise<void>((r) => (resolveKill = r))
    const writer = async (mapId: number) => {
      const latest = await api<{ revision: { number: number; table: Table } }>(base, jar, `/api/maps/${mapId}/revisions/latest`)
      let parent = latest.body.revision.number
      const table = latest.body.revision.table
      for (let i = 0; !killed; i++) {
        const t: Table = { ...table, values: table.values.map((row, r) => row.map((v, c) => (r === 1 && c === 1 ? v + i + 1 : v))) }
        const message = `crash burst map ${mapId} save ${i}`
        try {
          const res = await api<{ revision: { number: number; checksum: string } }>(base, jar, `/api/maps/${mapId}/revisions`, { method: 'POST', body: JSON.stringify({ parentNumber: parent, message, notes: '', table: t }) })
          statuses[res.status] = (statuses[res.status] ?? 0) + 1
          if (res.status !== 201) throw new Error(`save answered ${res.status}: ${JSON.stringify(res.body)}`)
          acks.push({ mapId, number: res.body.revision.number, checksum: res.body.revision.checksum, message })
          parent = res.body.revision.number
          if (acks.length >= KILL_AFTER_ACKS && !killed) {
            killed = true
            killGroup(first.child, 'SIGKILL') // mid-burst: the other writers have saves in flight
            resolveKill()
          }
        } catch (e) {
          if (!killed) throw e
          statuses.lost = (statuses.lost ?? 0) + 1 // in flight at the kill: never acknowledged
          return
        }
      }
    }
    await within(Promise.all([...maps.map((m) => writer(m.id)), killedNow]), 300_000, 'the save burst')
    await within(first.exited, 30_000, 'the killed server')
    expect(isAlive(firstHolder)).toBe(false)
    // The dead server could not release its lock: the file still names it.
    expect(fs.readFileSync(lockFile, 'utf8')).toBe(String(firstHolder))

    // Second life on the same folder: the stale lock is taken over, the data is all there.
    const second = startServer(env, port)
    await waitReady(base, second.child)
    const histories = []
    for (const m of maps) histories.push(await api<{ revisions: RevisionRow[]; total: number }>(base, jar, `/api/maps/${m.id}/revisions?limit=500`)) // the session cookie outlives the restart
    const secondHolder = Number(fs.readFileSync(lockFile, 'utf8'))
    expect(secondHolder).not.toBe(firstHolder)
    expect(isAlive(secondHolder)).toBe(true)
    let missing = 0
    for (const [k, m] of maps.entries()) {
      const h = histories[k]
      expect(h.status).toBe(200)
      const numbers = h.body.revisions.map((r) => r.number).sort((a, b) => a - b)
      expect(numbers).toEqual(Array.from({ length: h.body.total }, (_, k) => k + 1)) // no holes, no duplicates
      for (const a of acks.filter((x) => x.mapId === m.id)) {
        const row = h.body.revisions.find((r) => r.number === a.number)
        if (!row) missing++
        expect(row && { number: row.number, checksum: row.checksum, message: row.message }).toEqual({ number: a.number, checksum: a.checksum, message: a.message })
      }
    }
    // It takes writes again, on top of the latest revision.
    const probe = await api<{ revision: { table: Table; number: number } }>(base, jar, `/api/maps/${maps[0].id}/revisions/latest`)
    const after = await api(base, jar, `/api/maps/${maps[0].id}/revisions`, { method: 'POST', body: JSON.stringify({ parentNumber: probe.body.revision.number, message: 'after the crash', notes: '', table: probe.body.revision.table }) })
    expect(after.status).toBe(201)
    console.log(`crash test: ${acks.length} saves acknowledged before SIGKILL (${JSON.stringify(statuses)}), ${acks.length - missing} of them present after restart; lock pid ${firstHolder} (dead) taken over by ${secondHolder}`)

    killGroup(second.child, 'SIGTERM')
    await within(second.exited, 30_000, 'the stopped server')
  }, 900_000)
})

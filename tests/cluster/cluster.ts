/**
 * A small deployment for the several-servers test: a fresh database on the PostgreSQL server the
 * test run names, one storage stand-in and one mail capture, and production app servers started as
 * separate processes (scripts/server.mjs), each a process group of its own so it can be killed hard.
 */
import { spawn, type ChildProcess } from 'node:child_process'
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import pg from 'pg'
import { startLocalServices } from '@/scripts/local-services.mjs'
import { freePort } from '@/tests/support/free-port'

const ROOT = path.resolve(__dirname, '../..')
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms))

/** A database of its own on the server `adminUrl` names; dropped by the returned function. */
export async function freshDatabase(adminUrl: string): Promise<{ url: string; drop: () => Promise<void> }> {
  const name = `mapwright_cluster_${process.pid}_${Date.now()}`
  const admin = new pg.Client({ connectionString: adminUrl })
  await admin.connect()
  await admin.query(`create database ${name}`)
  await admin.end()
  const url = new URL(adminUrl)
  url.pathname = `/${name}`
  return {
    url: url.toString(),
    drop: async () => {
      const c = new pg.Client({ connectionString: adminUrl })
      await c.connect()
      await c.query(`drop database if exists ${name} with (force)`)
      await c.end()
    },
  }
}

export interface Deployment {
  dir: string
  /** Environment every app process of the deployment shares (database, storage, mail, auth secret). */
  env: NodeJS.ProcessEnv
  outboxFile: string
  close: () => Promise<void>
}

/** Storage and mail stand-ins in this process, shared by every server started with `env`. */
export async function deployment(databaseUrl: string): Promise<Deployment> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'mapwright-cluster-'))
  const saved = { S3_ENDPOINT: process.env.S3_ENDPOINT, SMTP_URL: process.env.SMTP_URL }
  delete process.env.S3_ENDPOINT
  delete process.env.SMTP_URL
  const services = await startLocalServices(dir, { s3: 0, smtp: 0 })
  Object.assign(process.env, saved)
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...services.env,
    NODE_ENV: 'production',
    DATABASE_URL: databaseUrl,
    PG_POOL_MAX: '5',
    NEXTAUTH_SECRET: 'cluster-secret-0123456789abcdef-shared',
    MAPWRIGHT_DEMO: '1',
  }
  delete env.PGLITE_DATA_DIR
  delete env.TEST_DATABASE_URL
  return {
    dir,
    env,
    outboxFile: String(services.env.MAIL_OUTBOX_FILE),
    close: async () => {
      await services.close()
      fs.rmSync(dir, { recursive: true, force: true })
    },
  }
}

/** Run a script of the repository to the end (migrations and the demo data, say). */
export function runScript(args: string[], env: NodeJS.ProcessEnv): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn(path.join(ROOT, 'node_modules/.bin/tsx'), args, { cwd: ROOT, env, stdio: ['ignore', 'pipe', 'pipe'] })
    let out = ''
    child.stdout.on('data', (b: Buffer) => (out += b.toString()))
    child.stderr.on('data', (b: Buffer) => (out += b.toString()))
    child.on('error', reject)
    child.on('exit', (code) => (code === 0 ? resolve(out) : reject(new Error(`${args.join(' ')} exited ${code}:\n${out}`))))
  })
}

export interface AppServer {
  name: string
  url: string
  pid: number
  /** The last lines it printed, for a failure message. */
  log: () => string
  /** SIGKILL: no shutdown hook runs, as when a machine dies. */
  kill: () => Promise<void>
  /** SIGTERM and wait for a clean exit. */
  stop: () => Promise<void>
  exited: () => boolean
}

/** Start `node scripts/server.mjs` on a free port and wait until its health route says 200. */
export async function startServer(name: string, d: Deployment): Promise<AppServer> {
  const port = await freePort()
  const url = `http://127.0.0.1:${port}`
  const child: ChildProcess = spawn(process.execPath, ['scripts/server.mjs', '-H', '127.0.0.1', '-p', String(port)], {
    cwd: ROOT,
    env: { ...d.env, NEXTAUTH_URL: url },
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
  })
  const lines: string[] = []
  const keep = (b: Buffer) => {
    lines.push(...b.toString().split('\n').filter(Boolean).map((l) => `[${name}] ${l}`))
    if (lines.length > 200) lines.splice(0, lines.length - 200)
  }
  child.stdout?.on('data', keep)
  child.stderr?.on('data', keep)
  let exited = false
  const exit = new Promise<void>((resolve) => child.once('exit', () => { exited = true; resolve() }))
  const signal = async (sig: NodeJS.Signals) => {
    if (exited || !child.pid) return
    try { process.kill(-child.pid, sig) } catch { /* already gone */ }
    await exit
  }
  const server: AppServer = {
    name,
    url,
    pid: child.pid!,
    log: () => lines.join('\n'),
    kill: () => signal('SIGKILL'),
    stop: async () => {
      const hard = setTimeout(() => void signal('SIGKILL'), 15_000)
      await signal('SIGTERM')
      clearTimeout(hard)
    },
    exited: () => exited,
  }
  const deadline = Date.now() + 120_000
  for (;;) {
    if (exited) throw new Error(`${name} exited while starting:\n${server.log()}`)
    if (Date.now() > deadline) {
      await server.kill()
      throw new Error(`${name} did not become healthy on ${url} within 120 s:\n${server.log()}`)
    }
    try {
      if ((await fetch(`${url}/api/health`)).status === 200) return server
    } catch { /* not listening yet */ }
    await sleep(300)
  }
}

/** JSON calls with a session cookie; the answer's status and body, never a throw for a 4xx/5xx. */
export async function call(base: string, cookie: string, method: string, p: string, body?: unknown, headers: Record<string, string> = {}) {
  const res = await fetch(`${base}${p}`, {
    method,
    headers: { cookie, ...(body !== undefined && !(body instanceof Uint8Array) ? { 'content-type': 'application/json' } : {}), ...headers },
    body: body === undefined ? undefined : body instanceof Uint8Array ? (body as unknown as BodyInit) : JSON.stringify(body),
  })
  const text = await res.text()
  let json: unknown = null
  try { json = text ? JSON.parse(text) : null } catch { json = text }
  // Answers of many routes, read loosely: the test's expectations check their shape.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  return { status: res.status, json: json as Record<string, any> }
}

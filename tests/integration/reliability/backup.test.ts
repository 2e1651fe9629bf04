// npm run db:backup / db:restore round trip, as an operator runs them: a PGlite folder with data written
// through the db layer, backed up, changed, restored; the restored folder holds the backed-up state and
// the replaced one is kept aside. Both scripts refuse a folder a live process holds. With
// TEST_DATABASE_URL the same round trip runs through pg_dump / pg_restore on a new PostgreSQL database.
import { spawn, spawnSync, type SpawnSyncReturns } from 'node:child_process'
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'

const root = process.cwd()
const tsx = path.join(root, 'node_modules', '.bin', 'tsx')
const cli = path.join(root, 'tests/integration/reliability/helpers/db-cli.ts')
const work = fs.mkdtempSync(path.join(os.tmpdir(), 'mw-backup-'))
afterAll(() => fs.rmSync(work, { recursive: true, force: true }))

type Target = { PGLITE_DATA_DIR: string } | { DATABASE_URL: string }

function envFor(target: Target): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env }
  delete env.DATABASE_URL
  delete env.PGLITE_DATA_DIR
  return { ...env, ...target }
}

function run(target: Target, script: string, args: string[]): SpawnSyncReturns<string> {
  return spawnSync(tsx, [script, ...args], { cwd: root, env: envFor(target), encoding: 'utf8', timeout: 120_000 })
}

function ok(r: SpawnSyncReturns<string>): string {
  expect(r.status, `${r.stdout}\n${r.stderr}`).toBe(0)
  return r.stdout
}

const emails = (t: Target): string[] => JSON.parse(ok(run(t, cli, ['emails'])).trim().split('\n').pop()!)

describe('db:backup and db:restore on a PGlite folder', () => {
  it('round trip: the restored folder holds the backed-up state, the replaced one is kept aside', () => {
    const dir = path.join(work, 'pglite')
    const t = { PGLITE_DATA_DIR: dir }
    ok(run(t, cli, ['add-user', 'before@backup.example']))
    const file = path.join(work, 'copy.tar.gz')
    const out = ok(run(t, 'scripts/db-backup.mjs', [file]))
    expect(out).toMatch(/checked: the copy opens and holds 1 users/)
    expect(fs.existsSync(file)).toBe(true)
    expect(fs.existsSync(path.join(dir, 'mapwright.lock'))).toBe(false) // the lock was released

    ok(run(t, cli, ['add-user', 'after@backup.example']))
    expect(emails(t)).toEqual(['after@backup.example', 'before@backup.example'])

    const restored = ok(run(t, 'scripts/db-restore.mjs', [file]))
    expect(emails(t)).toEqual(['before@backup.example'])
    const aside = /kept at (\S+);/.exec(restored)?.[1]
    expect(aside).toBeTruthy()
    // Nothing is lost: the folder that was replaced still opens and still holds the later user.
    expect(emails({ PGLITE_DATA_DIR: aside! })).toEqual(['after@backup.example', 'before@backup.example'])
    expect(fs.existsSync(path.join(dir, 'mapwright.lock'))).toBe(false)
  }, 180_000)

  it('refuses to back up or restore a folder a live process holds; a dead holder is taken over', async () => {
    const dir = path.join(work, 'held')
    const t = { PGLITE_DATA_DIR: dir }
    ok(run(t, cli, ['add-user', 'kept@backup.example']))
    const file = path.join(work, 'held.tar.gz')
    ok(run(t, 'scripts/db-backup.mjs', [file]))

    // node --import tsx, not the tsx binary: one process, so the pid we kill is the pid in the lock file.
    const holder = spawn(process.execPath, ['--import', 'tsx', cli, 'hold'], { cwd: root, env: envFor(t), stdio: ['ignore', 'pipe', 'inherit'] })
    await new Promise<void>((resolve) => holder.stdout.on('data', (d: Buffer) => d.toString().includes('holding') && resolve()))
    const holderPid = Number(fs.readFileSync(path.join(dir, 'mapwright.lock'), 'utf8'))
    expect(holderPid).toBe(holder.pid)
    const before = fs.readdirSync(path.dirname(dir)).sort()
    const backup = run(t, 'scripts/db-backup.mjs', [path.join(work, 'refused.tar.gz')])
    expect(backup.status).not.toBe(0)
    expect(backup.stderr).toMatch(new RegExp(`in use by another Mapwright process \\(pid ${holderPid}\\)`))
    expect(fs.existsSync(path.join(work, 'refused.tar.gz'))).toBe(false)
    const restore = run(t, 'scripts/db-restore.mjs', [file])
    expect(restore.status).not.toBe(0)
    expect(restore.stderr).toMatch(/Stop the server first/)
    expect(fs.readdirSync(path.dirname(dir)).sort()).toEqual(before) // no folder renamed, none left behind

    holder.kill('SIGKILL') // dies without releasing: the lock file now names a dead pid
    await new Promise((r) => holder.once('exit', r))
    expect(fs.readFileSync(path.join(dir, 'mapwright.lock'), 'utf8')).toBe(String(holderPid))
    ok(run(t, 'scripts/db-restore.mjs', [file]))
    expect(emails(t)).toEqual(['kept@backup.example'])
  }, 180_000)

  it('a missing file or an empty folder is refused with a message, not a stack trace', () => {
    const t = { PGLITE_DATA_DIR: path.join(work, 'nothing-here') }
    const b = run(t, 'scripts/db-backup.mjs', [path.join(work, 'x.tar.gz')])
    expect(b.status).toBe(1)
    expect(b.stderr).toMatch(/no PGlite database/)
    const r = run(t, 'scripts/db-restore.mjs', [path.join(work, 'does-not-exist.tar.gz')])
    expect(r.status).toBe(1)
    expect(r.stderr).toMatch(/No backup file/)
  }, 60_000)
})

const adminUrl = process.env.TEST_DATABASE_URL
const pgTools = spawnSync('sh', ['-c', 'command -v pg_dump && command -v pg_restore']).status === 0

describe.runIf(adminUrl && pgTools)('db:backup and db:restore on PostgreSQL (pg_dump / pg_restore)', () => {
  it('round trip on a new database', async () => {
    const { Client } = await import('pg')
    const name = `mw_backup_${process.pid}_${Math.random().toString(36).slice(2, 8)}`
    const admin = new Client({ connectionString: adminUrl })
    await admin.connect()
    await admin.query(`create database ${name}`)
    try {
      const url = new URL(adminUrl!)
      url.pathname = `/${name}`
      const t = { DATABASE_URL: url.toString() }
      ok(run(t, cli, ['add-user', 'before@pg.example']))
      const file = path.join(work, 'pg.dump')
      ok(run(t, 'scripts/db-backup.mjs', [file]))
      ok(run(t, cli, ['add-user', 'after@pg.example']))
      const out = ok(run(t, 'scripts/db-restore.mjs', [file]))
      expect(emails(t)).toEqual(['before@pg.example'])
      const aside = /kept in (\S+\.dump)/.exec(out)?.[1]
      expect(aside && fs.existsSync(aside)).toBe(true)
      fs.rmSync(aside!, { force: true })
    } finally {
      await admin.query(`drop database if exists ${name} with (force)`)
      await admin.end()
    }
  }, 180_000)
})

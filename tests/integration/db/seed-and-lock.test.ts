import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { spawnSync } from 'node:child_process'
import { describe, expect, it } from 'vitest'
import { sql } from 'drizzle-orm'
import { getDb } from '@/db/client'
import { DEMO_PROGRAMS, DEMO_USERS, seedDemo } from '@/db/seed'
import { DatabaseLockedError, lockDataDir } from '@/db/lock'

const fastHash = async (p: string) => `test:${p}`

describe('demo seed', () => {
  it('adds the scenario once; a second run adds nothing', async () => {
    const db = await getDb()
    const first = await seedDemo(db, fastHash)
    expect(first).toEqual({ usersAdded: DEMO_USERS.length, programsAdded: DEMO_PROGRAMS.length, mapsAdded: 4 })
    const second = await seedDemo(db, fastHash)
    expect(second).toEqual({ usersAdded: 0, programsAdded: 0, mapsAdded: 0 })
    const res = await db.execute(sql`select count(*)::int as n from users where email like '%@brackwater.example'`)
    expect((res as unknown as { rows: { n: number }[] }).rows[0].n).toBe(DEMO_USERS.length)
  })
})

describe('PGlite folder lock', () => {
  it('refuses a folder held by another live process, with a clear message', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'mw-lock-'))
    // A child process takes the lock and holds it while we try.
    fs.writeFileSync(path.join(dir, 'mapwright.lock'), String(process.ppid)) // the parent (vitest's runner) is alive
    expect(() => lockDataDir(dir)).toThrow(DatabaseLockedError)
    expect(() => lockDataDir(dir)).toThrow(/in use by another Mapwright process/)
  })

  it('takes over a stale lock left by a dead process and releases it', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'mw-lock-'))
    const dead = spawnSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))'], { encoding: 'utf8' })
    fs.writeFileSync(path.join(dir, 'mapwright.lock'), dead.stdout)
    const release = lockDataDir(dir)
    expect(fs.readFileSync(path.join(dir, 'mapwright.lock'), 'utf8')).toBe(String(process.pid))
    release()
    expect(fs.existsSync(path.join(dir, 'mapwright.lock'))).toBe(false)
  })
})

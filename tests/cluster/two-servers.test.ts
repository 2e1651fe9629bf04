// Two production app servers on one PostgreSQL, one storage stand-in and one mail capture: a mixed
// workload alternating between them, then one server killed (SIGKILL) while it analyses a large
// drive log. The other must finish that analysis once the lease runs out; every acknowledged save
// must be there; no message may be sent twice; sign-in throttling must count across both.
// Needs a production build and TEST_DATABASE_URL (npm test's PostgreSQL pass provides both).
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { Readable } from 'node:stream'
import { pipeline } from 'node:stream/promises'
import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { DEMO_PASSWORD } from '@/db/seed'
import { generateLogChunks } from '@/tests/support/log-generator'
import { signIn, trySignIn } from '@/tests/support/sign-in'
import { call, deployment, freshDatabase, runScript, startServer, type AppServer, type Deployment } from './cluster'

const adminUrl = process.env.TEST_DATABASE_URL
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms))
const figures: string[] = []
const say = (line: string) => { figures.push(line); console.log(`[two servers] ${line}`) }

/** Lines of the mail capture: one per message the SMTP stand-in received. */
function captured(file: string): { to: string[]; raw: string }[] {
  if (!fs.existsSync(file)) return []
  return fs.readFileSync(file, 'utf8').split('\n').filter(Boolean).map((l) => JSON.parse(l))
}

/** A message's subject as the capture holds it (RFC 2047 words decoded well enough for a match). */
function subjectOf(raw: string): string {
  const m = /^Subject: (.*(?:\r?\n[ \t].*)*)/m.exec(raw)
  const s = (m?.[1] ?? '').replace(/\r?\n[ \t]/g, ' ')
  return s.replace(/=\?utf-8\?([bq])\?([^?]*)\?=\s*/gi, (_w, enc: string, text: string) =>
    enc.toLowerCase() === 'b' ? Buffer.from(text, 'base64').toString('utf8') : decodeURIComponent(text.replace(/_/g, ' ').replace(/=([0-9a-f]{2})/gi, '%$1')),
  )
}

describe.skipIf(!adminUrl)('two app servers on one PostgreSQL', () => {
  let db: { url: string; drop: () => Promise<void> }
  let dep: Deployment
  let servers: AppServer[] = []
  let sql: pg.Client
  const session: Record<string, string> = {}

  beforeAll(async () => {
    db = await freshDatabase(adminUrl!)
    dep = await deployment(db.url)
    // Migrations run once, before any server starts (docs/deploy.md), then the demo data.
    await runScript(['--conditions=react-server', 'scripts/migrate.ts'], dep.env)
    await runScript(['--conditions=react-server', 'scripts/seed.ts'], dep.env)
    servers = await Promise.all([startServer('A', dep), startServer('B', dep)])
    sql = new pg.Client({ connectionString: db.url })
    await sql.connect()
    // Sessions are signed with the shared secret: each user signs in on one server and uses both.
    const users = { calib: 'calib', calib2: 'calib2', lead: 'lead', lead2: 'lead2', driver: 'driver' }
    let i = 0
    for (const [k, local] of Object.entries(users)) session[k] = (await signIn(servers[i++ % 2].url, `${local}@brackwater.example`, DEMO_PASSWORD)).cookie
  }, 300_000)

  afterAll(async () => {
    for (const s of servers) await s.stop().catch(() => {})
    await sql?.end().catch(() => {})
    await dep?.close()
    await db?.drop().catch(() => {})
    if (figures.length) console.log(`\nTwo-server figures:\n  ${figures.join('\n  ')}`)
  }, 60_000)

  const [A, B] = [0, 1]
  const at = (i: number) => servers[i % 2].url

  it('concurrent saves on one map through both servers: one wins each round, every acknowledged save is stored', async () => {
    const maps = (await call(at(A), session.calib, 'GET', '/api/maps')).json.maps as { id: number; name: string; kind: string }[]
    const map = maps.find((m) => m.kind === 'drive')!
    const before = Number((await sql.query('select count(*) from map_revisions where map_id = $1', [map.id])).rows[0].count)
    const acknowledged: { number: number; value: number }[] = []
    const rounds = 8
    let conflicts = 0
    const t0 = Date.now()
    for (let round = 0; round < rounds; round++) {
      const { latest } = (await call(at(round), session.calib, 'GET', `/api/maps/${map.id}`)).json
      // Four editors save on the same parent at once, two through each server, each a different cell value.
      const tries = [0, 1, 2, 3].map(async (k) => {
        const table = structuredClone(latest.table)
        const value = Math.round(table.values[1][1] * 0.9) + k
        table.values[1][1] = value
        const who = k % 2 ? session.calib2 : session.calib
        const r = await call(at(k), who, 'POST', `/api/maps/${map.id}/revisions`, { parentNumber: latest.number, message: `round ${round} editor ${k}`, notes: '', table })
        return { r, value }
      })
      const results = await Promise.all(tries)
      const won = results.filter((x) => x.r.status === 201)
      conflicts += results.filter((x) => x.r.status === 409).length
      expect(won, `round ${round}: ${results.map((x) => `${x.r.status} ${JSON.stringify(x.r.json).slice(0, 120)}`).join('; ')}`).toHaveLength(1)
      expect(results.every((x) => x.r.status === 201 || x.r.status === 409)).toBe(true)
      acknowledged.push({ number: won[0].r.json.revision.number, value: won[0].value })
    }
    const rows = (await sql.query('select number, "table" from map_revisions where map_id = $1 order by number', [map.id])).rows as { number: number; table: { values: number[][] } }[]
    expect(rows).toHaveLength(before + rounds)
    for (const a of acknowledged) expect(rows.find((r) => r.number === a.number)?.table.values[1][1], `revision ${a.number}`).toBe(a.value)
    say(`saves: ${rounds} rounds × 4 concurrent saves on one map through both servers → ${acknowledged.length} acknowledged (one per round), ${conflicts} refused with 409, all ${acknowledged.length} stored (${((Date.now() - t0) / 1000).toFixed(1)} s)`)
  })

  it('submissions, approvals and password-reset mails through both servers: each message sent exactly once', async () => {
    const t0 = Date.now()
    const { rows: [{ max: mailBefore }] } = await sql.query('select coalesce(max(id), 0) as max from mail_outbox')
    const maps = (await call(at(B), session.calib, 'GET', '/api/maps')).json.maps as { id: number; kind: string }[]
    const drives = maps.filter((m) => m.kind === 'drive')
    let approvals = 0
    for (const [i, m] of drives.slice(0, 2).entries()) {
      const { latest } = (await call(at(i), session.calib, 'GET', `/api/maps/${m.id}`)).json
      const table = structuredClone(latest.table)
      table.values[2][2] = Math.round(table.values[2][2] * 0.95)
      const saved = await call(at(i), session.calib, 'POST', `/api/maps/${m.id}/revisions`, { parentNumber: latest.number, message: `for review ${i}`, notes: '', table })
      expect(saved.status).toBe(201)
      const rev = saved.json.revision.id
      expect((await call(at(i), session.calib, 'POST', `/api/revisions/${rev}/actions`, { action: 'submit', comment: '' })).status).toBe(200)
      const approve = await call(at(i + 1), i ? session.lead2 : session.lead, 'POST', `/api/revisions/${rev}/actions`, { action: 'approve', comment: 'Checked on both servers' })
      expect(approve.status, JSON.stringify(approve.json)).toBe(200)
      approvals++
    }
    // Password-reset requests for four accounts, alternating servers, at the same time.
    const resets = ['calib3', 'driver2', 'admin', 'lead2'].map((u, i) => call(at(i), '', 'POST', '/api/password/forgot', { email: `${u}@brackwater.example` }))
    for (const r of await Promise.all(resets)) expect(r.status).toBe(200)

    // Both servers' senders race for the same rows; wait until nothing is left to send.
    let pending = 1
    for (let waited = 0; pending > 0 && waited < 60_000; waited += 250) {
      pending = Number((await sql.query(`select count(*) from mail_outbox where id > $1 and status <> 'sent'`, [mailBefore])).rows[0].count)
      if (pending) await sleep(250)
    }
    expect(pending, 'mail still unsent after 60 s').toBe(0)
    await sleep(1000) // a duplicate would arrive in this time
    const rows = (await sql.query('select id, "to", subject from mail_outbox order by id')).rows as { id: number; to: string[]; subject: string }[]
    const got = captured(dep.outboxFile)
    const key = (to: string[], subject: string) => `${[...to].sort().join(',')}|${subject}`
    const want = rows.map((r) => key(r.to, r.subject)).sort()
    const have = got.map((g) => key(g.to, subjectOf(g.raw))).sort()
    expect(have).toEqual(want)
    const fresh = rows.filter((r) => r.id > Number(mailBefore)).length
    expect(fresh).toBeGreaterThanOrEqual(4 + approvals)
    say(`mail: ${rows.length} messages in the outbox (${fresh} from this workload: ${approvals} submit + approve cycles, 4 password resets), ${got.length} received by the SMTP stand-in, none twice (${((Date.now() - t0) / 1000).toFixed(1)} s)`)
  })

  it('failed sign-ins counted on one server refuse the attempt on the other', async () => {
    const email = 'driver2@brackwater.example'
    const outcomes: string[] = []
    let attempt = 0
    for (; attempt < 12; attempt++) {
      const r = await trySignIn(at(attempt), email, 'not the password')
      outcomes.push(`${'AB'[attempt % 2]}:${r.error}`)
      if (/Too many failed sign-ins/.test(r.error)) break
    }
    // Eight failures, split four and four between the servers, then a refusal: neither server alone saw eight.
    expect(attempt, outcomes.join(' | ')).toBe(8)
    const right = await Promise.all([trySignIn(at(A), email, DEMO_PASSWORD), trySignIn(at(B), email, DEMO_PASSWORD)])
    for (const r of right) {
      expect(r.ok).toBe(false)
      expect(r.error).toMatch(/Too many failed sign-ins/)
    }
    say(`sign-in throttle: 8 wrong passwords alternating A/B (4 each), the 9th attempt refused on ${'AB'[attempt % 2]}, and the right password refused on both`)
  })

  it('a server killed while analysing a large log: the other finishes it after the lease runs out', async () => {
    const sets = (await call(at(B), session.driver, 'GET', '/api/sets')).json.sets as { id: number; status: string; drive: unknown; regen: unknown }[]
    const set = sets.find((s) => s.status === 'testing') ?? sets[0]
    const report = {
      setId: set.id, drivenOn: '2026-11-30', vehicleUnit: 'T-17', route: 'Two-server proving loop', surface: 'wet-asphalt', weather: 'Rain',
      ambientC: 6, loadCase: 'laden', payloadKg: 12_000, trailer: false,
      ratings: { launch: 4, tipIn: 4, steadyPedal: 4, liftOffRegen: 3, brakeBlending: 4 }, comments: '', flags: [],
    }
    // Small logs through both servers first: each analysed once, by whichever worker claimed it.
    const small = fs.mkdtempSync(path.join(os.tmpdir(), 'mapwright-cluster-log-'))
    const smallFile = path.join(small, 'short.csv')
    await pipeline(Readable.from(generateLogChunks({ seed: 7, durationS: 120, rateHz: 50 })), fs.createWriteStream(smallFile))
    const smallIds: number[] = []
    for (const i of [A, B, A, B]) {
      const r = await call(at(i), session.driver, 'POST', '/api/reports', report)
      expect(r.status, JSON.stringify(r.json)).toBe(201)
      const up = await call(at(i), session.driver, 'POST', `/api/reports/${r.json.report.id}/logs?name=short.csv`, new Uint8Array(fs.readFileSync(smallFile)), { 'content-type': 'text/csv' })
      expect(up.status, JSON.stringify(up.json)).toBe(201)
      smallIds.push(up.json.log.id)
    }

    // The large log: 10 h at 50 Hz, well over a hundred megabytes, so its analysis takes seconds.
    const bigFile = path.join(small, 'long.csv')
    await pipeline(Readable.from(generateLogChunks({ seed: 11, durationS: 10 * 3600, rateHz: 50 })), fs.createWriteStream(bigFile))
    const bytes = fs.statSync(bigFile).size
    const filed = await call(at(A), session.driver, 'POST', '/api/reports', { ...report, route: 'Two-server long haul' })
    const upload = await fetch(`${at(A)}/api/reports/${filed.json.report.id}/logs?name=long.csv`, {
      method: 'POST',
      headers: { cookie: session.driver, 'content-type': 'text/csv', 'content-length': String(bytes) },
      body: Readable.toWeb(fs.createReadStream(bigFile)) as ReadableStream,
      duplex: 'half',
    } as RequestInit)
    expect(upload.status).toBe(201)
    const bigId = ((await upload.json()) as { log: { id: number } }).log.id

    // Wait until a worker is part-way through it, then kill that worker's server without warning.
    // Progress is written about once a second; on a fast machine the kill may come before the first write.
    let row: { status: string; claimed_by: string | null; progress_bytes: string; attempts: number } | undefined
    let seenAnalysing = 0
    for (let waited = 0; waited < 120_000; waited += 50) {
      row = (await sql.query('select status, claimed_by, progress_bytes, attempts from drive_logs where id = $1', [bigId])).rows[0]
      if (row?.status === 'analysing') seenAnalysing ||= Date.now()
      if (row?.status === 'analysing' && (Number(row.progress_bytes) > 0 || Date.now() - seenAnalysing > 1200)) break
      if (row?.status === 'done' || row?.status === 'failed') break
      await sleep(50)
    }
    expect(row?.status, 'the large log was never seen mid-analysis').toBe('analysing')
    const holder = servers.find((s) => row!.claimed_by!.includes(`:${s.pid}:`))
    expect(holder, `claimed_by ${row!.claimed_by} names neither server (pids ${servers.map((s) => s.pid)})`).toBeDefined()
    const survivor = servers.find((s) => s !== holder)!
    const progressAtKill = Number(row!.progress_bytes)
    const killedAt = Date.now()
    await holder!.kill()

    // Saves keep arriving while the survivor waits for the lease: only through the survivor now.
    const maps = (await call(survivor.url, session.calib, 'GET', '/api/maps')).json.maps as { id: number; kind: string }[]
    const mapId = maps.find((m) => m.kind === 'regen')!.id
    const acked: number[] = []
    let done: { status: string; attempts: number; claimed_by: string | null; error_message: string | null } | undefined
    while (Date.now() - killedAt < 180_000) {
      done = (await sql.query('select status, attempts, claimed_by, error_message from drive_logs where id = $1', [bigId])).rows[0]
      if (done?.status === 'done' || done?.status === 'failed') break
      const { latest } = (await call(survivor.url, session.calib, 'GET', `/api/maps/${mapId}`)).json
      const s = await call(survivor.url, session.calib, 'POST', `/api/maps/${mapId}/revisions`, { parentNumber: latest.number, message: `during recovery ${acked.length}`, notes: '', table: latest.table })
      if (s.status === 201) acked.push(s.json.revision.number)
      await sleep(1000)
    }
    const recoveredS = (Date.now() - killedAt) / 1000
    expect(done?.status, `${done?.error_message}\n${survivor.log()}`).toBe('done')
    expect(done?.attempts).toBe(2) // one interrupted lease, then the survivor's run
    // The result is the survivor's, read through the survivor's API.
    const logs = (await call(survivor.url, session.driver, 'GET', `/api/reports/${filed.json.report.id}/logs`)).json.logs as { id: number; status: string }[]
    expect(logs.find((l) => l.id === bigId)?.status).toBe('done')
    const stored = (await sql.query('select number from map_revisions where map_id = $1', [mapId])).rows.map((r) => r.number)
    for (const n of acked) expect(stored).toContain(n)
    const smallDone = (await sql.query(`select count(*) from drive_logs where id = any($1) and status = 'done'`, [smallIds])).rows[0].count
    expect(Number(smallDone)).toBe(4)
    expect((await fetch(`${survivor.url}/api/health`)).status).toBe(200)
    say(`uploads: 4 short logs (${(fs.statSync(smallFile).size / 1e6).toFixed(1)} MB each) through both servers, all analysed once; a ${(bytes / 1e6).toFixed(0)} MB log uploaded to A`)
    say(`kill: ${holder!.name} held the large log at ${((100 * progressAtKill) / bytes).toFixed(0)} % and was killed (SIGKILL); ${survivor.name} finished it ${recoveredS.toFixed(1)} s later (30 s lease + 2 s poll + re-analysis); ${acked.length} saves acknowledged by ${survivor.name} meanwhile, all stored`)
    fs.rmSync(small, { recursive: true, force: true })
  }, 400_000)
})

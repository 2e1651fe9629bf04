/**
 * API under load: the production server on 127.0.0.1 (fresh demo database on PGlite), signed in as
 * the demo calibration engineer, driven by autocannon: each read for a fixed time, the saves to a count:
 * GET /api/maps/:id, GET /api/maps/:id/diff?a=1&b=2, and sequential POST /api/maps/:id/revisions
 * with the parent number kept current (one connection). The framework's own ceiling is measured in
 * the same server and run: GET /api/session, a signed-in route with the same session check and no
 * query, run just before and just after the map read; the map read is reported as a share of it.
 */
import autocannon from 'autocannon'
import type { MapTable } from '@/maps'
import { figure, isMain, runStandalone, type BenchResult, type Figure } from './report'
import { signIn, startServer, type BenchServer } from './server'

const BENCH = 'api-load'
const READ_CONNECTIONS = 10
// Reads run for a fixed time: autocannon notices a reached `amount` only on its one-second tick, so a
// capped run's duration (and rate) came out in whole seconds, up to 10 % low.
const READ_S = 10
const SAVE_AMOUNT = 300
const TIME_CAP_S = 15

/** Runs autocannon, stopping it at TIME_CAP_S even when `amount` is not reached (amount overrides duration). */
function cannon(opts: autocannon.Options): Promise<autocannon.Result> {
  return new Promise((resolve, reject) => {
    const inst = autocannon({ timeout: 10, ...opts }, (err, res) => { clearTimeout(cap); if (err) reject(err); else resolve(res) })
    const cap = setTimeout(() => inst.stop(), TIME_CAP_S * 1000)
  })
}

const rps = (r: autocannon.Result) => r['2xx'] / Math.max(r.duration, 1e-3)

function figures(name: string, r: autocannon.Result, targets: { rps?: number; p99: number }): Figure[] {
  const ok = r['2xx']
  const note = `${ok} × 2xx in ${r.duration.toFixed(1)} s${r.non2xx ? `, ${r.non2xx} non-2xx` : ''}${r.errors ? `, ${r.errors} errors` : ''}`
  return [
    figure(BENCH, `${name}: requests/s`, rps(r), 'req/s', targets.rps ? { op: '>=', limit: targets.rps } : undefined, note),
    figure(BENCH, `${name}: p50 latency`, r.latency.p50, 'ms'),
    figure(BENCH, `${name}: p99 latency`, r.latency.p99, 'ms', { op: '<', limit: targets.p99 }),
  ]
}

interface MapSummary { id: number; name: string; kind: string; latestNumber: number | null }

export async function runApiLoad(shared?: BenchServer): Promise<BenchResult> {
  const server = shared ?? (await startServer())
  try {
    const { baseUrl } = server
    const { cookie } = await signIn(baseUrl)
    const headers = { cookie }
    const list = (await (await fetch(`${baseUrl}/api/maps`, { headers })).json()) as { maps: MapSummary[] }
    const map = list.maps.find((m) => m.kind === 'drive' && (m.latestNumber ?? 0) >= 2)
    if (!map) throw new Error('no demo drive map with two revisions')
    const got = (await (await fetch(`${baseUrl}/api/maps/${map.id}`, { headers })).json()) as { latest: { number: number; table: MapTable } }
    const table = got.latest.table
    const readUrl = `${baseUrl}/api/maps/${map.id}`
    const ceilingUrl = `${baseUrl}/api/session`
    const diffUrl = `${baseUrl}/api/maps/${map.id}/diff?a=1&b=2`

    // Warm-up: first requests compile and JIT the route code.
    await cannon({ url: ceilingUrl, headers, connections: 4, amount: 300 })
    await cannon({ url: readUrl, headers, connections: 4, amount: 300 })
    await cannon({ url: diffUrl, headers, connections: 4, amount: 300 })

    const ceilingBefore = await cannon({ url: ceilingUrl, headers, connections: READ_CONNECTIONS, duration: READ_S })
    const read = await cannon({ url: readUrl, headers, connections: READ_CONNECTIONS, duration: READ_S })
    const ceilingAfter = await cannon({ url: ceilingUrl, headers, connections: READ_CONNECTIONS, duration: READ_S })
    const ceilingRps = (rps(ceilingBefore) + rps(ceilingAfter)) / 2
    const diff = await cannon({ url: diffUrl, headers, connections: READ_CONNECTIONS, duration: READ_S })

    // Saves: one connection, each save on top of the previous one; the body is built per request.
    const ctx = { parent: got.latest.number, n: 0 }
    const saveBody = () => {
      ctx.n++
      const values = table.values.map((row, r) => (r === table.values.length - 1 ? row.map((v, c) => (c === 0 ? Math.max(0, v - (ctx.n % 10)) : v)) : row))
      return JSON.stringify({ parentNumber: ctx.parent, message: `Bench save ${ctx.n}`, notes: '', table: { ...table, values } })
    }
    const save = await cannon({
      url: `${baseUrl}/api/maps/${map.id}/revisions`,
      connections: 1,
      amount: SAVE_AMOUNT,
      requests: [{
        method: 'POST',
        setupRequest: (req) => ({ ...req, headers: { ...headers, 'content-type': 'application/json' }, body: saveBody() }),
        onResponse: (status, body) => {
          if (status === 201) ctx.parent = (JSON.parse(body) as { revision: { number: number } }).revision.number
        },
      }],
    })
    return {
      bench: BENCH,
      figures: [
        ...figures(`GET /api/session, the ceiling (${READ_CONNECTIONS} conns, before the map read)`, ceilingBefore, { p99: 20 }),
        ...figures(`GET /api/session, the ceiling (${READ_CONNECTIONS} conns, after the map read)`, ceilingAfter, { p99: 20 }),
        ...figures(`GET /api/maps/:id (${READ_CONNECTIONS} conns)`, read, { rps: 1000, p99: 20 }),
        figure(BENCH, 'GET /api/maps/:id as a share of the ceiling', rps(read) / ceilingRps, 'ratio', { op: '>=', limit: 0.6 }, `against the mean of the two ceiling runs, ${ceilingRps.toFixed(0)} req/s`),
        ...figures(`GET diff a=1 b=2 (${READ_CONNECTIONS} conns)`, diff, { rps: 500, p99: 50 }),
        ...figures('POST revisions (sequential)', save, { p99: 100 }),
      ],
      notes: [`map ${map.id} "${map.name}", ${table.rowAxis.length} × ${table.colAxis.length} cells; server: next start on PGlite`],
    }
  } finally {
    if (!shared) await server.stop()
  }
}

if (isMain(import.meta.url)) void runStandalone(BENCH, () => runApiLoad())

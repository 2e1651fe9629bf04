// Fuzzed bodies against the program, map, revision, import and traction-proposal routes (a
// calibration engineer's session), and fuzzed query strings against the read-only physics routes.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import * as programsRoute from '@/app/api/programs/route'
import * as programRoute from '@/app/api/programs/[id]/route'
import * as mapsRoute from '@/app/api/maps/route'
import * as revisionsRoute from '@/app/api/maps/[id]/revisions/route'
import * as importRoute from '@/app/api/maps/[id]/import/route'
import * as proposeRoute from '@/app/api/maps/[id]/revisions/[number]/propose/route'
import * as overlayRoute from '@/app/api/maps/[id]/revisions/[number]/overlay/route'
import * as simulateRoute from '@/app/api/maps/[id]/revisions/[number]/simulate/route'
import { programInputSchema } from '@/app/_schemas/program'
import { createMapSchema, importCsvSchema, saveRevisionSchema } from '@/app/_schemas/map'
import { proposeBodySchema } from '@/app/_lib/physics/propose'
import { demoTipper } from '@/db/demo/programs'
import { toCsv } from '@/maps'
import { call } from '@/tests/support/api'
import { programAndMap, SMALL_DRIVE } from '@/tests/support/fixtures'
import { expectWellFormedError, fuzzRoute, snapshot } from './harness'

describe('fuzz: programs and maps', () => {
  it('POST /api/programs, PUT /api/programs/:id', async () => {
    const { cookie, programId } = await programAndMap()
    const valid = { name: 'Fuzzed tipper', description: 'made by the fuzzer', params: demoTipper }
    await fuzzRoute({ name: 'POST /api/programs', handler: programsRoute.POST, method: 'POST', cookie, schema: programInputSchema, valid })
    await fuzzRoute({ name: 'PUT /api/programs/:id', handler: programRoute.PUT, method: 'PUT', cookie, params: { id: String(programId) }, schema: programInputSchema, valid })
  }, 120_000)

  it('POST /api/maps, POST /api/maps/:id/revisions, POST /api/maps/:id/import', async () => {
    const { cookie, programId, mapId } = await programAndMap()
    const id = String(mapId)
    await fuzzRoute({ name: 'POST /api/maps', handler: mapsRoute.POST, method: 'POST', cookie, schema: createMapSchema, valid: { programId, name: 'Fuzz map', kind: 'drive', description: '', message: 'First', table: SMALL_DRIVE } })
    await fuzzRoute({ name: 'POST /api/maps/:id/revisions', handler: revisionsRoute.POST, method: 'POST', cookie, params: { id }, schema: saveRevisionSchema, valid: { parentNumber: 1, message: 'Fuzzed save', notes: '', table: SMALL_DRIVE } })
    const latest = (await call(revisionsRoute.GET, { cookie, params: { id } })).body.total as number
    await fuzzRoute({ name: 'POST /api/maps/:id/import', handler: importRoute.POST, method: 'POST', cookie, params: { id }, schema: importCsvSchema, valid: { parentNumber: latest, message: 'Fuzzed import', notes: '', csv: toCsv(SMALL_DRIVE) } })
  }, 120_000)

  it('POST /api/maps/:id/revisions/:number/propose (nothing is ever saved)', async () => {
    const { cookie, mapId } = await programAndMap()
    await fuzzRoute({ name: 'POST /api/maps/:id/revisions/:number/propose', handler: proposeRoute.POST, method: 'POST', cookie, params: { id: String(mapId), number: '1' }, schema: proposeBodySchema, valid: { loadCase: 'laden', surface: 'wet-asphalt', marginPct: 10, gradePct: 4 } })
  }, 120_000)

  it('GET overlay and simulate with fuzzed query strings (read-only: never a 500, nothing changes)', async () => {
    const { cookie, mapId } = await programAndMap()
    const value = fc.oneof(fc.constantFrom('', 'empty', 'laden', 'trailer-laden', 'dry-asphalt', 'ice', 'launch', 'liftoff', 'NaN', 'Infinity', '-1', '1e999', '0x10', '30.0001', '100', '1e-400', ' 5 ', '%00', '🚛'), fc.double().map(String), fc.string({ maxLength: 12 }))
    const keys = fc.constantFrom('loadCase', 'surface', 'gradePct', 'mode', 'pedalPct', 'rampS', 'initialSpeedKmh', 'durationS', 'extra', '__proto__')
    const query = fc.dictionary(keys, value, { maxKeys: 8 })
    const before = await snapshot()
    const counts: Record<string, number> = {}
    for (const [name, handler] of [['overlay', overlayRoute.GET], ['simulate', simulateRoute.GET]] as const) {
      await fc.assert(
        fc.asyncProperty(query, fc.constantFrom('1', 'latest', '0', '-1', '99999999999', 'x'), async (q, number) => {
          counts[name] = (counts[name] ?? 0) + 1
          const path = `/api/maps/${mapId}/revisions/${number}/${name}?${new URLSearchParams(q).toString()}`
          const res = await call(handler, { cookie, path, params: { id: String(mapId), number } })
          const ctx = `${path} → ${res.status} ${JSON.stringify(res.body)?.slice(0, 300)}`
          expect(res.status, ctx).toBeLessThan(500)
          if (res.status >= 400) expectWellFormedError(res.status, res.body, path)
        }),
        { numRuns: 100, endOnFailure: true },
      )
    }
    expect(await snapshot()).toEqual(before)
    console.log(`fuzz cases run: GET overlay ${counts.overlay}, GET simulate ${counts.simulate} (query strings)`)
  }, 120_000)
})

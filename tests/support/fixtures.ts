// Integration fixtures: a vehicle program and a map with its first revision, created through the real API.
import * as programsRoute from '@/app/api/programs/route'
import * as mapsRoute from '@/app/api/maps/route'
import { demoTipper } from '@/db/demo/programs'
import type { MapTable } from '@/maps'
import type { PublicUser } from '@/db/queries/users'
import { call, makeUser, sessionCookie } from './api'

export const SMALL_DRIVE: MapTable = {
  kind: 'drive',
  rowAxis: [0, 50, 100],
  colAxis: [0, 20, 60],
  values: [
    [100, 0, 0],
    [800, 700, 400],
    [1600, 1500, 800],
  ],
}

export async function programAndMap(table: MapTable = SMALL_DRIVE): Promise<{
  engineer: PublicUser
  cookie: string
  programId: number
  mapId: number
}> {
  const engineer = await makeUser('calibration_engineer')
  const cookie = await sessionCookie(engineer)
  const p = await call(programsRoute.POST, { method: 'POST', cookie, body: { name: `Program ${Math.random()}`, description: '', params: demoTipper } })
  const m = await call(mapsRoute.POST, {
    method: 'POST',
    cookie,
    body: { programId: p.body.program.id, name: 'Launch', kind: table.kind, table, message: 'First cut' },
  })
  if (m.status !== 201) throw new Error(`fixture map not created: ${JSON.stringify(m.body)}`)
  return { engineer, cookie, programId: p.body.program.id, mapId: m.body.mapId }
}

export function withCell(t: MapTable, r: number, c: number, v: number): MapTable {
  return { ...t, values: t.values.map((row, i) => row.map((x, j) => (i === r && j === c ? v : x))) }
}

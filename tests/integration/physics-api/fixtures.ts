// A program with a drive and a regen map, made through the queries the app uses.
import { demoDriveTable, demoRegenTable } from '@/db/demo/maps'
import { demoTipper } from '@/db/demo/programs'
import { createMap } from '@/db/queries/maps'
import { createProgram } from '@/db/queries/programs'
import { DEFAULT_RELEASE_CONDITIONS } from '@/app/_schemas/program'
import { makeUser } from '@/tests/support/api'

export async function tipperWithMaps() {
  const author = await makeUser('calibration_engineer')
  const program = await createProgram({ name: `Tipper ${Math.random().toString(36).slice(2, 8)}`, description: '', params: demoTipper, releaseConditions: DEFAULT_RELEASE_CONDITIONS, reason: '' }, author.id)
  const drive = await createMap({ programId: program.id, name: 'Drive', kind: 'drive', description: '', message: 'first', table: demoDriveTable(demoTipper, { gamma: 1.5, share: 1 }) }, author.id)
  const regen = await createMap({ programId: program.id, name: 'Regen', kind: 'regen', description: '', message: 'first', table: demoRegenTable(demoTipper, { liftOffNm: 900, maxNm: 2400 }) }, author.id)
  return { author, program, driveId: String(drive.mapId), regenId: String(regen.mapId) }
}

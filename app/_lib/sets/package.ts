import 'server-only'
import { strToU8, zipSync, type Zippable } from 'fflate'
import { sha256Hex, verifiedChecksum } from '@/db/checksum'
import { SAFETY_CAUTION, toCHeader, toCsv, toJson, type MapKind, type MapTable } from '@/maps'
import type { AcknowledgementRecord, CoverageWaiverRecord, ReleaseConditions } from '@/db/schema'
import type { VehicleParams } from '@/physics/vehicle'
import type { RampLimits } from '@/maps/ramps'
import { rampsToCHeader, rampsToCsv, rampsToJson } from '@/maps/ramps-export'

export type PackageMode = 'release' | 'test'

/** Everything a package holds, as plain data frozen at release: names are as they were then. */
export interface PackageRecord {
  program: { id: number; name: string }
  set: { id: number; number: number }
  parts: {
    kind: MapKind
    mapId: number
    mapName: string
    revisionId: number
    number: number
    checksum: string
    table: MapTable
    author: string
    approvedBy: string[]
  }[]
  paramVersion: { number: number; reason: string; createdAt: string; params: VehicleParams; releaseConditions: ReleaseConditions }
  /** The set's ramp limits; null when it holds none (old sets). */
  rampVersion?: { number: number; reason: string; createdAt: string; limits: RampLimits } | null
  acknowledgements: AcknowledgementRecord[]
  /** Release conditions no drive report covered, waived by the lead (absent or empty: none). */
  coverageWaivers?: CoverageWaiverRecord[]
  evidenceReportIds: number[]
  /** Release: who released and when. Test: who asked for the package and when it was built. */
  madeBy: string
  madeAt: string
}

export const TEST_NOTICE = 'TEST PACKAGE - NOT FOR RELEASE: for test drives on a closed course only; never flash it into a vehicle in service.'

const slug = (s: string) => s.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '')

/**
 * Zip entry times in DOS form have no time zone and fflate writes them from a Date's local
 * fields: giving it the UTC fields as local ones makes the bytes the same on every server.
 */
function dosTime(iso: string): Date {
  const u = new Date(iso)
  return new Date(u.getUTCFullYear(), u.getUTCMonth(), u.getUTCDate(), u.getUTCHours(), u.getUTCMinutes(), u.getUTCSeconds())
}

/**
 * The package of a set as a deterministic zip: fixed entry order, every entry stamped with the
 * record's time, so building it twice from the same record gives the same bytes. A release
 * package is built once at release and its bytes kept; a test package is marked in every file.
 * The manifest lists the SHA-256 of every other file.
 */
export function buildSetPackage(rec: PackageRecord, mode: PackageMode) {
  const test = mode === 'test'
  const base = `${slug(rec.program.name)}-set-${rec.set.number}${test ? '-test' : ''}`
  const files: [string, Uint8Array][] = []
  const add = (name: string, text: string) => files.push([name, strToU8(text)])
  const cNote = test ? `/*\n * ${TEST_NOTICE}\n */\n` : ''
  const hashNote = test ? `# ${TEST_NOTICE}\n` : ''
  for (const p of rec.parts) {
    const stem = `${p.kind}-${slug(p.mapName)}-r${p.number}`
    const header = toCHeader(p.table, { name: `${p.mapName}_${p.kind}`, revision: p.number, mapName: p.mapName, vehicleProgram: rec.program.name, checksum: verifiedChecksum(p.table, p.checksum) })
    add(`${stem}.h`, cNote + header)
    add(`${stem}.csv`, hashNote + toCsv(p.table))
    add(`${stem}.json`, test ? toJson(p.table).replace('{\n', `{\n  "notice": ${JSON.stringify(TEST_NOTICE)},\n`) : toJson(p.table))
  }
  const params = { format: 'mapwright-parameter-version', ...(test ? { notice: TEST_NOTICE } : {}), program: rec.program.name, ...rec.paramVersion }
  add(`parameters-v${rec.paramVersion.number}.json`, JSON.stringify(params, null, 2) + '\n')
  const ramps = rec.rampVersion ?? null
  if (ramps) {
    const stem = `ramps-v${ramps.number}`
    add(`${stem}.h`, cNote + rampsToCHeader(ramps.limits, { name: slug(rec.program.name).replace(/-/g, '_') || 'program', version: ramps.number, vehicleProgram: rec.program.name }))
    add(`${stem}.csv`, hashNote + rampsToCsv(ramps.limits))
    const json = rampsToJson(ramps.limits, ramps.number)
    add(`${stem}.json`, test ? json.replace('{\n', `{\n  "notice": ${JSON.stringify(TEST_NOTICE)},\n`) : json)
  }
  add('CAUTION.txt', (test ? TEST_NOTICE + '\n\n' : '') + SAFETY_CAUTION.join('\n') + '\n')
  const manifest = {
    format: 'mapwright-set-package',
    version: 1,
    package: test ? 'test' : 'release',
    ...(test ? { notice: TEST_NOTICE } : {}),
    program: rec.program,
    set: rec.set,
    revisions: rec.parts.map((p) => ({ kind: p.kind, map: p.mapName, mapId: p.mapId, revisionId: p.revisionId, revision: p.number, checksum: p.checksum, author: p.author, approvedBy: p.approvedBy })),
    checksumAlgorithm: 'revision checksum: SHA-256 of the canonical JSON of the table (docs/map-formats.md); file sha256: SHA-256 of the file bytes',
    parameterVersion: { number: rec.paramVersion.number, reason: rec.paramVersion.reason, createdAt: rec.paramVersion.createdAt, file: `parameters-v${rec.paramVersion.number}.json` },
    // Left out, not null, for a set without ramps: its manifest stays as it was before ramps were a part.
    ...(ramps ? { rampVersion: { number: ramps.number, reason: ramps.reason, createdAt: ramps.createdAt, files: ['h', 'csv', 'json'].map((x) => `ramps-v${ramps.number}.${x}`) } } : {}),
    acknowledgements: rec.acknowledgements.map((a) => ({ key: a.key, map: a.mapKind, revisionId: a.revisionId, surface: a.surface, loadCase: a.loadCase, reason: a.reason, by: a.byName, at: a.at, ...(a.cells !== undefined ? { cells: a.cells } : {}) })),
    // Only when there are any, so packages without waivers keep the bytes they always had.
    ...(rec.coverageWaivers?.length ? { coverageWaivers: rec.coverageWaivers.map((w) => ({ key: w.key, surface: w.surface, loadCase: w.loadCase, reason: w.reason, by: w.byName, at: w.at })) } : {}),
    evidenceReports: rec.evidenceReportIds,
    [test ? 'builtBy' : 'releasedBy']: rec.madeBy,
    [test ? 'builtAt' : 'releasedAt']: rec.madeAt,
    files: files.map(([name, bytes]) => ({ name, bytes: bytes.length, sha256: sha256Hex(bytes) })),
    caution: SAFETY_CAUTION,
  }
  add('manifest.json', JSON.stringify(manifest, null, 2) + '\n')
  const mtime = dosTime(rec.madeAt)
  const zippable: Zippable = {}
  for (const [name, bytes] of files) zippable[name] = [bytes, { mtime }]
  const bytes = zipSync(zippable, { level: 6, mtime })
  return { filename: `${base}.zip`, bytes, sha256: sha256Hex(bytes), manifest }
}

import { describe, expect, it } from 'vitest'
import { createHash } from 'node:crypto'
import { strFromU8, unzipSync } from 'fflate'
import { buildSetPackage, TEST_NOTICE, type PackageRecord } from '@/app/_lib/sets/package'
import { checksum } from '@/db/checksum'
import { fromCsv, fromJson } from '@/maps'
import { SMALL_DRIVE, vehicle } from '@/tests/support/fixtures'

const regen = { kind: 'regen' as const, rowAxis: [0, 100], colAxis: [0, 50], values: [[0, 300], [0, 900]] }
const record: PackageRecord = {
  program: { id: 4, name: 'Demo tipper' },
  set: { id: 9, number: 3 },
  parts: [
    { kind: 'drive', mapId: 1, mapName: 'Site drive', revisionId: 11, number: 2, checksum: checksum(SMALL_DRIVE), table: SMALL_DRIVE, author: 'A', approvedBy: ['L'] },
    { kind: 'regen', mapId: 2, mapName: 'Site regen', revisionId: 12, number: 1, checksum: checksum(regen), table: regen, author: 'A', approvedBy: ['L'] },
  ],
  paramVersion: { number: 2, reason: 'measured', createdAt: '2026-11-01T10:00:00.000Z', params: vehicle, releaseConditions: { surfaces: ['packed-snow'], loadCases: ['empty', 'laden'], marginPct: 10 } },
  acknowledgements: [],
  evidenceReportIds: [5, 7],
  madeBy: 'Lena Lead',
  madeAt: '2026-12-01T09:30:15.000Z',
}
const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex')

describe('set package', () => {
  it('is the same bytes when built twice, in any server time zone', () => {
    const tz = process.env.TZ
    try {
      process.env.TZ = 'UTC'
      const a = buildSetPackage(record, 'release')
      process.env.TZ = 'Pacific/Auckland'
      const b = buildSetPackage(structuredClone(record), 'release')
      expect(sha(b.bytes)).toBe(sha(a.bytes))
      expect(a.sha256).toBe(sha(a.bytes))
    } finally {
      process.env.TZ = tz
    }
  })

  it('lists a SHA-256 for every other file, and its maps read back to their checksums', () => {
    const p = buildSetPackage(record, 'release')
    const files = unzipSync(p.bytes)
    const manifest = JSON.parse(strFromU8(files['manifest.json']))
    expect(Object.keys(files)).toEqual(['drive-site-drive-r2.h', 'drive-site-drive-r2.csv', 'drive-site-drive-r2.json', 'regen-site-regen-r1.h', 'regen-site-regen-r1.csv', 'regen-site-regen-r1.json', 'parameters-v2.json', 'CAUTION.txt', 'manifest.json'])
    for (const f of manifest.files) expect(sha(files[f.name]), f.name).toBe(f.sha256)
    expect(checksum(fromCsv(strFromU8(files['drive-site-drive-r2.csv']), 'drive'))).toBe(manifest.revisions[0].checksum)
    expect(checksum(fromJson(strFromU8(files['regen-site-regen-r1.json'])))).toBe(manifest.revisions[1].checksum)
    expect(manifest).toMatchObject({ package: 'release', releasedBy: 'Lena Lead', releasedAt: record.madeAt, evidenceReports: [5, 7], parameterVersion: { number: 2 } })
  })

  it('marks every file of a test package, and the marked CSV and JSON still import', () => {
    const p = buildSetPackage(record, 'test')
    expect(p.filename).toBe('demo-tipper-set-3-test.zip')
    const files = unzipSync(p.bytes)
    for (const [name, bytes] of Object.entries(files)) expect(strFromU8(bytes), name).toContain(TEST_NOTICE)
    expect(fromCsv(strFromU8(files['drive-site-drive-r2.csv']), 'drive')).toEqual(SMALL_DRIVE)
    expect(fromJson(strFromU8(files['regen-site-regen-r1.json']))).toEqual(regen)
  })
})

import 'server-only'
import { strToU8, zipSync } from 'fflate'
import { verifiedChecksum } from '@/db/checksum'
import { toCHeader, toCsv, toJson } from '@/maps'
import { SAFETY_CAUTION } from '@/app/_components/safety-caution'
import type { RevisionContext } from './service'

/**
 * The release package: C header, CSV and JSON of the revision, a manifest that ties them to the
 * program, map, revision, checksum and approver, and the safety caution — as one zip file.
 */
export function releasePackage(ctx: RevisionContext, release: { approverName: string; releasedAt: Date; releaserName: string }) {
  const { map, revision: r } = ctx
  const base = `${map.programName}-${map.name}-r${r.number}`.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '')
  const manifest = {
    format: 'mapwright-release-package',
    version: 1,
    vehicleProgram: map.programName,
    map: map.name,
    kind: map.kind,
    revision: r.number,
    checksum: r.checksum,
    checksumAlgorithm: 'SHA-256 of the canonical JSON (docs/map-formats.md)',
    approver: release.approverName,
    releasedBy: release.releaserName,
    releasedAt: release.releasedAt.toISOString(),
    files: [`${base}.h`, `${base}.csv`, `${base}.json`],
    caution: SAFETY_CAUTION,
  }
  const files = {
    [`${base}.h`]: strToU8(toCHeader(r.table, { name: `${map.name}_${map.kind}`, revision: r.number, mapName: map.name, vehicleProgram: map.programName, checksum: verifiedChecksum(r.table, r.checksum) })),
    [`${base}.csv`]: strToU8(toCsv(r.table)),
    [`${base}.json`]: strToU8(toJson(r.table)),
    'manifest.json': strToU8(JSON.stringify(manifest, null, 2) + '\n'),
    'CAUTION.txt': strToU8(SAFETY_CAUTION + '\n'),
  }
  return { filename: `${base}-release.zip`, bytes: zipSync(files, { level: 6 }), manifest }
}

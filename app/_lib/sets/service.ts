import 'server-only'
import { randomUUID } from 'node:crypto'
import { Readable } from 'node:stream'
import { getDb } from '@/db/client'
import { sha256Hex } from '@/db/checksum'
import { getRevisionWithMap } from '@/db/queries/maps'
import { emailOfUser, emailsOfRole } from '@/db/queries/mail'
import { getParamVersionByNumber, latestParamVersion } from '@/db/queries/param-versions'
import { getRampVersionByNumber, latestRampVersion } from '@/db/queries/ramp-versions'
import { listReports } from '@/db/queries/reports'
import { listRevisionEvents } from '@/db/queries/review'
import { createSet, getSet, openSafetyConcerns, recordSetRelease, recordSetWithdrawal, SET_STATUS_LABELS, type MapSetFull, type SetPart } from '@/db/queries/sets'
import type { Acknowledgement, AcknowledgementRecord, CoverageWaiverRecord } from '@/db/schema'
import { crossChecks, limitsFromVehicle, validate, type CrossCheck, type Finding } from '@/maps'
import type { SessionUser } from '../auth/session'
import { ConflictError, ForbiddenError, HttpError, NotFoundError, ValidationError, isUniqueViolation } from '../http/errors'
import { appUrl, nudgeMail } from '../mail/sender'
import { deleteObject, getObjectStream, putObjectStream } from '../storage/object-store'
import { setGate, type SetGatePart, type SetGateResult } from './gate'
import { buildSetPackage, type PackageMode, type PackageRecord } from './package'
import { replayEvidence } from './replay-evidence'

export async function loadSet(id: number): Promise<MapSetFull> {
  const set = await getSet(id)
  if (!set) throw new NotFoundError(`Map set ${id}`)
  return set
}

/** How messages name a set: its program and number (the URL's id is another number). */
const label = (set: Pick<MapSetFull, 'programName' | 'number'>) => `${set.programName} · Set ${set.number}`

const partsOf = (set: MapSetFull): SetPart[] => [set.drive, set.regen].filter((p): p is SetPart => p !== null)

const gateParts = (set: MapSetFull): SetGatePart[] => partsOf(set).map((p) => ({ kind: p.kind, revisionId: p.revisionId, number: p.number, mapName: p.mapName, state: p.state, table: p.table }))

/**
 * The gate of a set as it stands, with these acknowledgements and coverage waivers (by default those its latest
 * release recorded). Traction keys (`traction:…`) acknowledge exceptions; coverage keys (`coverage:…`) waive conditions.
 */
export async function setGateFor(set: MapSetFull, acknowledgements: Acknowledgement[] = recordedAcks(set)): Promise<SetGateResult> {
  const reports = await listReports({ setId: set.id })
  const concerns = await openSafetyConcerns(partsOf(set).map((p) => p.revisionId))
  const margin = set.paramVersion.releaseConditions.replayMarginNm
  const replay = margin === undefined ? null : await replayEvidence(set, margin)
  return setGate({ parts: gateParts(set), vehicle: set.paramVersion.params, conditions: set.paramVersion.releaseConditions, reports, concerns, acknowledgements, ramps: set.rampVersion?.limits ?? null, replay })
}

const recordedAcks = (set: MapSetFull): Acknowledgement[] => {
  const r = set.releases[0]
  return r ? [...r.acknowledgements, ...r.coverageWaivers] : []
}

export interface SetFindings {
  maps: { kind: SetPart['kind']; revisionId: number; findings: Finding[] }[]
  crossChecks: CrossCheck[]
}

/** Each map's findings against the set's parameter version, and the checks across the two maps. */
export function setFindings(set: MapSetFull): SetFindings {
  const limits = limitsFromVehicle(set.paramVersion.params)
  return {
    maps: partsOf(set).map((p) => ({ kind: p.kind, revisionId: p.revisionId, findings: validate(p.table, limits) })),
    crossChecks: set.drive && set.regen ? crossChecks(set.drive.table, set.regen.table) : [],
  }
}

/**
 * Make the set of a drive revision, a regen revision and a parameter version of one program
 * (the latest version when none is named). Drafts are allowed: trucks are tested before approval.
 */
export async function createSetFor(user: SessionUser, input: { driveRevisionId: number; regenRevisionId: number; paramVersion?: number; rampVersion?: number | null; note: string }) {
  const drive = await getRevisionWithMap(input.driveRevisionId)
  if (!drive) throw new ValidationError(`driveRevisionId: revision ${input.driveRevisionId} does not exist`)
  const regen = await getRevisionWithMap(input.regenRevisionId)
  if (!regen) throw new ValidationError(`regenRevisionId: revision ${input.regenRevisionId} does not exist`)
  if (drive.map.kind !== 'drive') throw new ValidationError(`driveRevisionId: revision ${input.driveRevisionId} belongs to “${drive.map.name}”, a ${drive.map.kind} map`)
  if (regen.map.kind !== 'regen') throw new ValidationError(`regenRevisionId: revision ${input.regenRevisionId} belongs to “${regen.map.name}”, a ${regen.map.kind} map`)
  if (drive.map.programId !== regen.map.programId)
    throw new ValidationError(`regenRevisionId: the regen map belongs to “${regen.map.programName}”, the drive map to “${drive.map.programName}”; a set is one program's`)
  const programId = drive.map.programId
  const version = input.paramVersion === undefined ? await latestParamVersion(programId) : await getParamVersionByNumber(programId, input.paramVersion)
  if (!version) throw new ValidationError(`paramVersion: ${drive.map.programName} has no parameter version ${input.paramVersion ?? ''}`.trim())
  const ramps =
    input.rampVersion === null ? null : input.rampVersion === undefined ? await latestRampVersion(programId) : await getRampVersionByNumber(programId, input.rampVersion)
  if (input.rampVersion != null && !ramps) throw new ValidationError(`rampVersion: ${drive.map.programName} has no ramp version ${input.rampVersion}`)
  return createSet({ programId, driveRevisionId: drive.revision.id, regenRevisionId: regen.revision.id, paramVersionId: version.id, rampVersionId: ramps?.id ?? null, note: input.note, createdBy: user.id })
}

/** Approvers of a revision by name, as the review events recorded them. */
async function approversOf(revisionId: number): Promise<string[]> {
  const events = await listRevisionEvents({ revisionId })
  return [...new Set(events.filter((e) => e.action === 'approve').map((e) => e.actorName))]
}

async function packageRecord(set: MapSetFull, acknowledgements: AcknowledgementRecord[], madeBy: string, madeAt: Date, coverageWaivers: CoverageWaiverRecord[] = []): Promise<PackageRecord> {
  const reports = await listReports({ setId: set.id })
  return {
    program: { id: set.programId, name: set.programName },
    set: { id: set.id, number: set.number },
    parts: await Promise.all(
      partsOf(set).map(async (p) => ({ kind: p.kind, mapId: p.mapId, mapName: p.mapName, revisionId: p.revisionId, number: p.number, checksum: p.checksum, table: p.table, author: p.authorName, approvedBy: await approversOf(p.revisionId) })),
    ),
    paramVersion: { number: set.paramVersion.number, reason: set.paramVersion.reason, createdAt: set.paramVersion.createdAt.toISOString(), params: set.paramVersion.params, releaseConditions: set.paramVersion.releaseConditions },
    rampVersion: set.rampVersion && { number: set.rampVersion.number, reason: set.rampVersion.reason, createdAt: set.rampVersion.createdAt.toISOString(), limits: set.rampVersion.limits },
    acknowledgements,
    coverageWaivers,
    evidenceReportIds: reports.map((r) => r.id).sort((a, b) => a - b),
    madeBy,
    madeAt: madeAt.toISOString(),
  }
}

/** The test package of a set: built from the set as created (its time and its creator), so it too is the same at every download. */
export async function testPackage(set: MapSetFull) {
  return buildSetPackage(await packageRecord(set, [], set.createdByName ?? 'unknown', set.createdAt), 'test')
}

/**
 * Release a set to its program (lead engineers). The gate is judged here with the lead's
 * acknowledgements; the package is built once, its bytes stored and their SHA-256 written with
 * the release in one transaction with the revisions' states, events, audit row and mail.
 */
export async function releaseSet(set: MapSetFull, actor: SessionUser, acks: Acknowledgement[]) {
  if (actor.role !== 'lead_engineer') throw new ForbiddenError('Releasing a set needs the role lead engineer')
  if (set.status === 'released') throw new ConflictError(`${label(set)} is already the released set of ${set.programName}`)
  if (set.status === 'withdrawn')
    throw new ConflictError(`${label(set)}'s release was withdrawn and its revisions with it; to release these maps again, save them as new revisions, have them approved and make a set of those`)
  const gate = await setGateFor(set, acks)
  // A waiver is for a condition no report covers; one for a covered condition would record a reason for nothing.
  const waivable = new Set(gate.coverage.filter((c) => c.reports === 0).map((c) => c.key))
  const unknown = acks.filter((a) => !gate.exceptions.some((e) => e.key === a.key) && !waivable.has(a.key))
  if (unknown.length) throw new ValidationError(`acknowledgements: ${unknown.map((a) => a.key).join(', ')} match no exception or uncovered release condition of this set`)
  if (!gate.ok) throw new ConflictError('The release gate is not passed: ' + gate.conditions.filter((c) => !c.met).map((c) => c.summary).join('; '), { gate })
  const at = new Date()
  const records: AcknowledgementRecord[] = gate.exceptions.map((e) => {
    const a = acks.find((x) => x.key === e.key)!
    return { key: e.key, reason: a.reason.trim(), mapKind: e.mapKind, revisionId: e.revisionId, surface: e.surface, loadCase: e.loadCase, cells: e.cells.length, byId: actor.id, byName: actor.name, at: at.toISOString() }
  })
  const waivers: CoverageWaiverRecord[] = gate.coverage
    .filter((c) => c.waiver !== null)
    .map((c) => ({ key: c.key, reason: c.waiver!, surface: c.surface, loadCase: c.loadCase, byId: actor.id, byName: actor.name, at: at.toISOString() }))
  const pkg = buildSetPackage(await packageRecord(set, records, actor.name, at, waivers), 'release')
  const key = `packages/program-${set.programId}/set-${set.number}/${at.getTime()}-${randomUUID()}.zip`
  await putObjectStream(key, Readable.from([Buffer.from(pkg.bytes)]), 'application/zip')
  const parts = partsOf(set)
  const to = [...new Set([...(await emailsOfRole('lead_engineer')), ...(await Promise.all(parts.map((p) => emailOfUser(p.authorId)))).flat()])]
  const what = `${set.programName} · set ${set.number}`
  const db = await getDb()
  let releaseId: number | null
  try {
    releaseId = await db.transaction((tx) =>
      recordSetRelease(tx, {
        setId: set.id,
        programId: set.programId,
        releasedBy: actor.id,
        releasedAt: at,
        acknowledgements: records,
        coverageWaivers: waivers,
        package: { key, name: pkg.filename, bytes: pkg.bytes.length, sha256: pkg.sha256, manifest: pkg.manifest },
        revisionIds: parts.map((p) => p.revisionId),
        mail: [{ to, subject: `Released: ${what}`, text: `${actor.name} released ${what} (${parts.map((p) => `${p.mapName} r${p.number}`).join(', ')}, parameter version ${set.paramVersion.number}).\n\nPackage SHA-256: ${pkg.sha256}\nOpen: ${appUrl(`/sets/${set.id}`)}\n` }],
      }),
    )
  } catch (e) {
    await deleteObject(key).catch(() => {})
    if (isUniqueViolation(e)) throw new ConflictError(`Someone released another set of ${set.programName} at the same moment; reload and try again`)
    throw e
  }
  if (releaseId === null) {
    // Another lead released this very set a moment ago: theirs stands, this package was never recorded.
    await deleteObject(key).catch(() => {})
    throw new ConflictError(`${label(set)} was released by someone else a moment ago; reload to see that release`)
  }
  nudgeMail()
  return { gate, sha256: pkg.sha256, filename: pkg.filename }
}

/** Withdraw a set's current release (lead engineers, reason required); the release it replaced comes back. */
export async function withdrawSet(set: MapSetFull, actor: SessionUser, reason: string) {
  if (actor.role !== 'lead_engineer') throw new ForbiddenError('Withdrawing a release needs the role lead engineer')
  if (!reason.trim()) throw new ValidationError('reason: say why the release is withdrawn')
  if (set.status !== 'released') throw new ConflictError(`${label(set)} is not the released set of ${set.programName} (it is “${SET_STATUS_LABELS[set.status]}”)`)
  const parts = partsOf(set)
  const to = [...new Set([...(await emailsOfRole('lead_engineer')), ...(await Promise.all(parts.map((p) => emailOfUser(p.authorId)))).flat()])]
  const db = await getDb()
  const result = await db.transaction((tx) =>
    recordSetWithdrawal(tx, {
      setId: set.id,
      programId: set.programId,
      actorId: actor.id,
      reason: reason.trim(),
      mail: [{ to, subject: `Release withdrawn: ${set.programName} · set ${set.number}`, text: `${actor.name} withdrew the release of set ${set.number}.\n\nReason: ${reason.trim()}\nOpen: ${appUrl(`/sets/${set.id}`)}\n` }],
    }),
  )
  if (!result.ok) throw new ConflictError(`${label(set)} was withdrawn or replaced a moment ago; reload`)
  nudgeMail()
  return result
}

async function readAll(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = []
  for await (const c of stream) chunks.push(Buffer.from(c))
  return Buffer.concat(chunks)
}

/**
 * The frozen release package of a set: exactly the bytes stored at release, checked against the
 * SHA-256 recorded with the release. A withdrawn release is refused (410) with its reason.
 */
export async function releasePackageOf(set: MapSetFull) {
  const rel = set.releases[0]
  if (!rel) throw new ConflictError(`Set ${set.number} has not been released; its test package is at ?kind=test`)
  if (rel.withdrawnAt)
    throw new HttpError(410, 'withdrawn', `The release of set ${set.number} was withdrawn on ${rel.withdrawnAt.toISOString().slice(0, 10)} (${rel.withdrawReason ?? 'no reason given'}); its package must not be used`)
  if (!rel.packageKey || !rel.packageSha256)
    throw new ConflictError(`Set ${set.number} was released before packages were frozen; no package was kept for it`)
  const bytes = await readAll(await getObjectStream(rel.packageKey))
  if (sha256Hex(bytes) !== rel.packageSha256) throw new HttpError(500, 'package_altered', `The stored package of set ${set.number} does not match the SHA-256 recorded at release; it is not served`)
  return { bytes, sha256: rel.packageSha256, filename: rel.packageName ?? `set-${set.number}.zip`, retired: rel.retiredAt !== null }
}

export async function packageOf(set: MapSetFull, mode: PackageMode) {
  if (mode === 'test') {
    const p = await testPackage(set)
    return { bytes: Buffer.from(p.bytes), sha256: p.sha256, filename: p.filename, retired: false }
  }
  return releasePackageOf(set)
}

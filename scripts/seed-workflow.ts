// Demo: put the invented scenario through the workflow so every role has something to look at —
// on the tipper, set 1 released and then withdrawn, set 2 released with drive reports and logs, set 3
// (a new drive revision and parameter version 2) under test with a report; on the tractor, a regen
// revision sent back. Runs once: skipped when any demo drive report exists.
import { Readable } from 'node:stream'
import { and, eq, sql } from 'drizzle-orm'
import type { Db } from '../db/client'
import type { ReviewAction } from '../domain/review-actions'
import type { RevisionState } from '../domain/revision-states'
import { driveReports, maps, mapRevisions, users, vehiclePrograms } from '../db/schema'
import { createReport } from '../db/queries/reports'
import { transitionRevision } from '../db/queries/review'
import { createLog } from '../db/queries/logs'
import { getProgram, updateProgram } from '../db/queries/programs'
import { createSet, getSet } from '../db/queries/sets'
import { latestRampVersion } from '../db/queries/ramp-versions'
import { latestParamVersion } from '../db/queries/param-versions'
import { analyse } from '../app/_lib/reports/log-jobs'
import { putObjectStream } from '../app/_lib/storage/object-store'
import { releaseSet, setGateFor, withdrawSet } from '../app/_lib/sets/service'
import type { SessionUser } from '../app/_lib/auth/session'
import { generateLog } from '../tests/support/log-generator'

async function user(db: Db, email: string): Promise<SessionUser> {
  const [u] = await db.select({ id: users.id, email: users.email, name: users.name, role: users.role }).from(users).where(eq(users.email, email))
  return u
}

async function revision(db: Db, mapName: string, number: number) {
  const [r] = await db
    .select({ id: mapRevisions.id, authorId: mapRevisions.authorId, mapId: maps.id })
    .from(mapRevisions)
    .innerJoin(maps, eq(maps.id, mapRevisions.mapId))
    .where(and(eq(maps.name, mapName), eq(mapRevisions.number, number)))
  return r
}

async function step(revisionId: number, actorId: number, action: ReviewAction, from: RevisionState, to: RevisionState, comment = '') {
  const r = await transitionRevision({ revisionId, actorId, action, from, to, comment })
  if (!r.ok) throw new Error(`demo workflow: ${action} on revision ${revisionId} found it ${r.currentState}`)
}

/** A drive report with a generated log (invented data), analysed like an upload. */
async function reportWithLog(setId: number, driverId: number, fields: Partial<Parameters<typeof createReport>[0]>, seed: number | null) {
  const id = await createReport(
    {
      setId,
      drivenOn: '2026-11-24',
      vehicleUnit: 'BX-07',
      route: 'Demo quarry haul road, loop 2',
      surface: 'gravel',
      weather: 'overcast, damp',
      ambientC: 7,
      loadCase: 'empty',
      payloadKg: 0,
      trailer: false,
      ratings: { launch: 3, tipIn: 4, steadyPedal: 4, liftOffRegen: 3, brakeBlending: 4 },
      comments: '',
      flags: [],
      ...fields,
    },
    driverId,
  )
  if (seed === null) return id
  const { csv } = generateLog({ seed, durationS: 600, rateHz: 50 })
  const objectKey = `logs/report-${id}/demo-${seed}.csv`
  await putObjectStream(objectKey, Readable.from([Buffer.from(csv)]), 'text/csv')
  const log = await createLog({ reportId: id, objectKey, fileName: `demo-log-${seed}.csv`, sizeBytes: Buffer.byteLength(csv), mapping: {} })
  await analyse(log.id)
  return id
}

/** Make a set of the two revisions and the program's latest parameter version. */
async function makeSet(programId: number, drive: number, regen: number, by: number, note: string) {
  const pv = await latestParamVersion(programId)
  const ramps = await latestRampVersion(programId)
  return (await createSet({ programId, driveRevisionId: drive, regenRevisionId: regen, paramVersionId: pv!.id, rampVersionId: ramps?.id ?? null, note, createdBy: by })).id
}

/**
 * Release a demo set, acknowledging each traction exception the gate finds with a demo reason, and waiving each
 * release condition no demo report covers (the demo drives only some surfaces).
 */
async function release(setId: number, lead: SessionUser) {
  const set = (await getSet(setId))!
  const gate = await setGateFor(set)
  const reason = 'Demo: snow and ice running are not planned for this program this season; drivers are briefed'
  const waiver = 'Demo: only the quarry road was open for test runs; the other surfaces and loads are booked for the next set'
  await releaseSet(set, lead, [...gate.exceptions.map((e) => ({ key: e.key, reason })), ...gate.uncovered.map((key) => ({ key, reason: waiver }))])
}

export async function seedWorkflow(db: Db): Promise<boolean> {
  const [{ n }] = await db.select({ n: sql<number>`count(*)::int` }).from(driveReports)
  if (Number(n) > 0) return false
  const lead = await user(db, 'lead@brackwater.example')
  const lead2 = await user(db, 'lead2@brackwater.example')
  const calib = await user(db, 'calib@brackwater.example')
  const dara = await user(db, 'driver@brackwater.example')
  const mika = await user(db, 'driver2@brackwater.example')
  const [tipper] = await db.select({ id: vehiclePrograms.id }).from(vehiclePrograms).where(eq(vehiclePrograms.name, 'BX-64 Tipper'))
  const reviewer = (authorId: number) => (authorId === lead.id ? lead2.id : lead.id)
  const approve = async (r: { id: number; authorId: number }) => {
    await step(r.id, r.authorId, 'submit', 'draft', 'in_review')
    await step(r.id, reviewer(r.authorId), 'approve', 'in_review', 'approved')
  }

  // Set 1: the first drive and regen revisions, approved, driven, released — then withdrawn.
  const d1 = await revision(db, 'Site drive', 1)
  const g1 = await revision(db, 'Site regen', 1)
  await approve(d1)
  await approve(g1)
  const set1 = await makeSet(tipper.id, d1.id, g1.id, d1.authorId, 'First road-legal candidate')
  await reportWithLog(set1, dara.id, { drivenOn: '2026-11-10', comments: 'Strong lift-off regen; the empty truck steps out on wet gravel at launch.', flags: [{ map: 'drive', pedalPct: 80, speedKmh: 2, what: 'tandem spins at launch, empty, wet gravel', severity: 3 }] }, null)
  await release(set1, lead)
  await withdrawSet((await getSet(set1))!, lead2, 'Launch spin on wet gravel when empty is worse than the model showed; set 2 softens the launch')

  // Set 2: softer tip-in and less lift-off regen, approved, driven with logs, released (current).
  const d2 = await revision(db, 'Site drive', 2)
  const g2 = await revision(db, 'Site regen', 2)
  await approve(d2)
  await approve(g2)
  const set2 = await makeSet(tipper.id, d2.id, g2.id, d2.authorId, 'Softer tip-in, gentler lift-off on loose surfaces')
  await reportWithLog(set2, dara.id, { comments: 'Smooth tip-in; the empty truck still spins the tandem on wet gravel above half pedal.', flags: [{ map: 'drive', pedalPct: 60, speedKmh: 3, what: 'wheel spin on launch, empty', severity: 3 }] }, 11)
  await release(set2, lead)

  // Parameter version 2: the laden centre of gravity measured after the body change, and a minimum lift-off
  // deceleration at the battery corners and a 12 % laden start (so the set under test shows those checks; sets 1 and 2 were released before them).
  const program = (await getProgram(tipper.id))!
  await updateProgram(tipper.id, { name: program.name, description: program.description, params: { ...program.params, ladenCgHeightM: program.params.ladenCgHeightM + 0.05 }, releaseConditions: { ...program.releaseConditions, minLiftOffDecelMps2: 0.3, startGradePct: 12 }, reason: 'Laden CG height measured on the tilt table after the body change (+5 cm); lift-off regen must keep 0.3 m/s² at the battery corners; a laden start on the quarry ramp (12 %)' }, calib.id)

  // Set 3: the launch-capped drive revision with set 2's regen, judged with version 2, under test.
  const d3 = await revision(db, 'Site drive', 3)
  await step(d3.id, d3.authorId, 'submit', 'draft', 'in_review')
  const set3 = await makeSet(tipper.id, d3.id, g2.id, d3.authorId, 'Launch cap for wet gravel, empty')
  await reportWithLog(set3, mika.id, { drivenOn: '2026-11-28', surface: 'wet-asphalt', weather: 'rain', comments: 'Launch cap works; no spin on the wet pad.' }, 23)

  // Tractor: Road regen r1 sent back with a comment.
  const rr = await revision(db, 'Road regen', 1)
  await step(rr.id, rr.authorId, 'submit', 'draft', 'in_review')
  await step(rr.id, reviewer(rr.authorId), 'send_back', 'in_review', 'returned', 'Lift-off regen still too strong above 60 km/h on loose surfaces')
  return true
}

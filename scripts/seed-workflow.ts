// Demo: put the invented scenario through the workflow — a released revision with a drive report and
// its log, one revision waiting for approval with a report, one sent back — so every role has something
// to look at. Runs once: skipped when any demo drive report exists.
import { Readable } from 'node:stream'
import { and, eq, sql } from 'drizzle-orm'
import type { Db } from '../db/client'
import type { ReviewAction } from '../domain/review-actions'
import type { RevisionState } from '../domain/revision-states'
import { driveReports, maps, mapRevisions, users } from '../db/schema'
import { createReport } from '../db/queries/reports'
import { recordRelease, transitionRevision } from '../db/queries/review'
import { createLog } from '../db/queries/logs'
import { analyse } from '../app/_lib/reports/log-jobs'
import { putObjectStream } from '../app/_lib/storage/object-store'
import { generateLog } from '../tests/support/log-generator'

async function userId(db: Db, email: string): Promise<number> {
  const [u] = await db.select({ id: users.id }).from(users).where(eq(users.email, email))
  return u.id
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
async function reportWithLog(db: Db, revisionId: number, driverId: number, fields: Partial<Parameters<typeof createReport>[0]>, seed: number) {
  const id = await createReport(
    {
      revisionId,
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
  const { csv } = generateLog({ seed, durationS: 600, rateHz: 50 })
  const objectKey = `logs/report-${id}/demo-${seed}.csv`
  await putObjectStream(objectKey, Readable.from([Buffer.from(csv)]), 'text/csv')
  const log = await createLog({ reportId: id, objectKey, fileName: `demo-log-${seed}.csv`, sizeBytes: Buffer.byteLength(csv), mapping: {} })
  await analyse(log.id)
  return id
}

export async function seedWorkflow(db: Db): Promise<boolean> {
  const [{ n }] = await db.select({ n: sql<number>`count(*)::int` }).from(driveReports)
  if (Number(n) > 0) return false
  const lead = await userId(db, 'lead@brackwater.example')
  const lead2 = await userId(db, 'lead2@brackwater.example')
  const dara = await userId(db, 'driver@brackwater.example')
  const mika = await userId(db, 'driver2@brackwater.example')

  // Site drive r2: reviewed, driven, approved and released.
  const r2 = await revision(db, 'Site drive', 2)
  const approver = r2.authorId === lead ? lead2 : lead
  await step(r2.id, r2.authorId, 'submit', 'draft', 'in_review')
  await reportWithLog(db, r2.id, dara, { comments: 'Smooth tip-in; the empty truck still spins the tandem on wet gravel above half pedal.', flags: [{ pedalPct: 60, speedKmh: 3, what: 'wheel spin on launch, empty', severity: 3 }] }, 11)
  await step(r2.id, approver, 'approve', 'in_review', 'approved')
  await transitionRevision({
    revisionId: r2.id, actorId: approver, action: 'release', from: 'approved', to: 'released', comment: '',
    extra: async (tx) => void (await recordRelease(tx, { mapId: r2.mapId, revisionId: r2.id, releasedBy: approver, acknowledgements: [{ key: 'traction:packed-snow:empty', reason: 'Demo: snow running is not planned for this program this season' }] })),
  })

  // Site drive r3: submitted, driven, waiting for a lead's approval.
  const r3 = await revision(db, 'Site drive', 3)
  await step(r3.id, r3.authorId, 'submit', 'draft', 'in_review')
  await reportWithLog(db, r3.id, mika, { drivenOn: '2026-11-28', surface: 'wet-asphalt', weather: 'rain', comments: 'Launch cap works; no spin on the wet pad.' }, 23)

  // Site regen r2: sent back with a comment.
  const g2 = await revision(db, 'Site regen', 2)
  await step(g2.id, g2.authorId, 'submit', 'draft', 'in_review')
  await step(g2.id, g2.authorId === lead ? lead2 : lead, 'send_back', 'in_review', 'returned', 'Lift-off regen still too strong above 60 km/h on loose surfaces')
  return true
}

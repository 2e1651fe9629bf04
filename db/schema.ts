import { sql, type SQL } from 'drizzle-orm'
import {
  bigint,
  boolean,
  date,
  real,
  check,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  type PgColumn,
} from 'drizzle-orm/pg-core'
// Relative imports: drizzle-kit loads this file without the `@/` alias.
import type { MapKind, MapTable } from '../maps/table'
import type { RampLimits } from '../maps/ramps'
import type { AnalysisResult } from '../physics/drive-log/types'
import { SURFACE_IDS, type SurfaceId } from '../physics/surfaces'
import { LOAD_CASE_IDS } from '../physics/load-cases'
import type { LoadCase, VehicleParams } from '../physics/vehicle'
import type { BatteryCorner } from '../physics/battery'
import { LINK_KINDS, type LinkKind } from '../domain/one-time-links'
import { LOG_STATUSES, type LogStatus } from '../domain/log-statuses'
import { MAIL_STATUSES, type MailStatus } from '../domain/mail-statuses'
import { SAFETY_STATES, type FlagSeverity, type SafetyState } from '../domain/report-safety'
import { REVIEW_ACTIONS, type ReviewAction } from '../domain/review-actions'
import { REVISION_STATES, type RevisionState } from '../domain/revision-states'
import { ROLES, type Role } from '../domain/roles'

/**
 * `column in ('a', 'b', …)` for a CHECK constraint, built from the domain constants so the database
 * refuses what the code does not know. Inlined as literals: a CHECK cannot take bind parameters.
 */
function oneOf(column: PgColumn, ids: readonly string[]): SQL {
  return sql`${column} in (${sql.raw(ids.map((id) => `'${id.replace(/'/g, "''")}'`).join(', '))})`
}

/** What the release gate checks: surfaces and load cases, and the traction margin in %. */
export interface ReleaseConditions {
  surfaces: SurfaceId[]
  loadCases: LoadCase[]
  marginPct: number
  /** Design lateral acceleration at the tyres, m/s²; absent in versions saved before it existed (physics default applies). */
  designLateralAccelMps2?: number
  /** Battery states for the lift-off check (added later; absent = none). */
  batteryCorners?: BatteryCorner[]
  /** Least lift-off deceleration a corner may leave, m/s² (absent = corners shown, nothing found). */
  minLiftOffDecelMps2?: number
  /** Comfort limits of the drivability manoeuvres and where they come from (absent: common-practice defaults). */
  maxPeakJerkMps3?: number
  maxTimeTo90S?: number
  comfortSource?: string
  /** Replay margin of the gate's optional evidence-replay condition, N·m (absent: no such condition). */
  replayMarginNm?: number
  /** Startability and gradeability, laden: steepest start grade %, and a grade % to hold at a speed km/h (absent: not checked). */
  startGradePct?: number
  holdGradePct?: number
  holdSpeedKmh?: number
}

/** A gate exception the lead released anyway, with the reason given. */
export interface Acknowledgement {
  key: string
  reason: string
}

/**
 * A lead's waiver of a release condition (surface × load case) that no drive report on the set covers:
 * key `coverage:<surface>:<loadCase>`, why, who and when. Kept with the release, like the acknowledgements.
 */
export interface CoverageWaiverRecord {
  key: string
  reason: string
  surface: SurfaceId
  loadCase: LoadCase
  byId: number
  byName: string
  at: string
}

/** An acknowledgement as a set release keeps it: which exception, why, who and when. */
export interface AcknowledgementRecord extends Acknowledgement {
  mapKind: MapKind
  revisionId: number
  surface: SurfaceId
  loadCase: LoadCase
  /** Cells beyond the limit less the margin when the lead acknowledged it (absent in releases older than sets). */
  cells?: number
  byId: number
  byName: string
  at: string
}

export const users = pgTable(
  'users',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    email: text('email').notNull(),
    name: text('name').notNull(),
    role: text('role').$type<Role>().notNull(),
    passwordHash: text('password_hash').notNull(),
    disabled: boolean('disabled').notNull().default(false),
    /** Carried in every session token; raised on a password change, reset or disabling to end all sessions. */
    sessionVersion: integer('session_version').notNull().default(1),
    /** Set when the account is made by invitation; cleared once a password is set (by the link or by an admin). */
    invitedAt: timestamp('invited_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('users_email_lower_idx').on(sql`lower(${t.email})`),
    check('users_role_check', oneOf(t.role, ROLES)),
  ],
)

export const vehiclePrograms = pgTable(
  'vehicle_programs',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
    params: jsonb('params').$type<VehicleParams>().notNull(),
    releaseConditions: jsonb('release_conditions')
      .$type<ReleaseConditions>()
      .notNull()
      .default({ surfaces: ['wet-asphalt', 'packed-snow'], loadCases: ['empty', 'laden'], marginPct: 10 }),
    createdBy: integer('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('vehicle_programs_name_idx').on(sql`lower(${t.name})`)],
)

/**
 * One numbered, immutable version of a program's parameters and release conditions. Every change
 * makes a new version (who, when, why); what the physics judges names the version it was judged
 * with. The program row keeps a copy of the latest version for the editor's live physics.
 */
export const paramVersions = pgTable(
  'param_versions',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    programId: integer('program_id')
      .notNull()
      .references(() => vehiclePrograms.id),
    /** Per-program sequence number, 1, 2, 3 … */
    number: integer('number').notNull(),
    params: jsonb('params').$type<VehicleParams>().notNull(),
    releaseConditions: jsonb('release_conditions').$type<ReleaseConditions>().notNull(),
    reason: text('reason').notNull(),
    createdBy: integer('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('param_versions_program_number_idx').on(t.programId, t.number)],
)

/**
 * One numbered, immutable version of a program's torque ramp limits (tip-in, tip-out, lash band):
 * a controller part a set holds beside its maps. Like parameter versions, a change makes a new one.
 */
export const rampVersions = pgTable(
  'ramp_versions',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    programId: integer('program_id')
      .notNull()
      .references(() => vehiclePrograms.id),
    /** Per-program sequence number, 1, 2, 3 … */
    number: integer('number').notNull(),
    limits: jsonb('limits').$type<RampLimits>().notNull(),
    reason: text('reason').notNull(),
    createdBy: integer('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('ramp_versions_program_number_idx').on(t.programId, t.number)],
)

export const maps = pgTable(
  'maps',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    programId: integer('program_id')
      .notNull()
      .references(() => vehiclePrograms.id),
    name: text('name').notNull(),
    kind: text('kind').$type<MapKind>().notNull(),
    description: text('description').notNull().default(''),
    createdBy: integer('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('maps_program_name_idx').on(t.programId, sql`lower(${t.name})`),
    check('maps_kind_check', sql`${t.kind} in ('drive', 'regen')`),
  ],
)

export const mapRevisions = pgTable(
  'map_revisions',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    mapId: integer('map_id')
      .notNull()
      .references(() => maps.id),
    /** Per-map sequence number, 1, 2, 3 …; unique per map so two racing saves cannot both win. */
    number: integer('number').notNull(),
    parentId: integer('parent_id'),
    authorId: integer('author_id')
      .notNull()
      .references(() => users.id),
    message: text('message').notNull(),
    notes: text('notes').notNull().default(''),
    table: jsonb('table').$type<MapTable>().notNull(),
    checksum: text('checksum').notNull(),
    state: text('state').$type<RevisionState>().notNull().default('draft'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('map_revisions_map_number_idx').on(t.mapId, t.number),
    index('map_revisions_map_created_idx').on(t.mapId, t.createdAt),
    check('map_revisions_state_check', oneOf(t.state, REVISION_STATES)),
  ],
)

export const auditLog = pgTable(
  'audit_log',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    actorId: integer('actor_id').references(() => users.id),
    action: text('action').notNull(),
    entityType: text('entity_type').notNull(),
    entityId: integer('entity_id'),
    details: jsonb('details').$type<Record<string, unknown>>().notNull().default({}),
    /** Client address as the server saw it (X-Forwarded-For first hop when behind a proxy). */
    ip: text('ip'),
  },
  (t) => [index('audit_log_entity_idx').on(t.entityType, t.entityId), index('audit_log_at_idx').on(t.at)],
)

/** Ratings on a small fixed scale, 1 (bad) … 5 (good). */
export interface ReportRatings {
  launch: number
  tipIn: number
  steadyPedal: number
  liftOffRegen: number
  brakeBlending: number
}

/** A point on the map where something was wrong; severity 4 is a safety concern. */
export interface ReportFlag {
  /** Which map of the report's set the point is on. */
  map: MapKind
  pedalPct: number
  speedKmh: number
  what: string
  severity: FlagSeverity
}

export const driveReports = pgTable(
  'drive_reports',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    /** The map set the truck ran: fixed when the report is filed; only a lead may correct it (audited). */
    setId: integer('set_id')
      .notNull()
      .references(() => mapSets.id),
    driverId: integer('driver_id')
      .notNull()
      .references(() => users.id),
    drivenOn: date('driven_on').notNull(),
    vehicleUnit: text('vehicle_unit').notNull(),
    route: text('route').notNull(),
    surface: text('surface').$type<SurfaceId>().notNull(),
    weather: text('weather').notNull(),
    ambientC: real('ambient_c').notNull(),
    loadCase: text('load_case').$type<LoadCase>().notNull(),
    payloadKg: real('payload_kg').notNull(),
    trailer: boolean('trailer').notNull(),
    ratings: jsonb('ratings').$type<ReportRatings>().notNull(),
    comments: text('comments').notNull().default(''),
    flags: jsonb('flags').$type<ReportFlag[]>().notNull().default([]),
    /** none | open | resolved: a severity-4 flag opens it; only a lead engineer closes it, with a comment. */
    safety: text('safety').$type<SafetyState>().notNull().default('none'),
    safetyResolvedBy: integer('safety_resolved_by').references(() => users.id),
    safetyResolvedAt: timestamp('safety_resolved_at', { withTimezone: true }),
    safetyResolution: text('safety_resolution'),
    /** Set when a lead engineer has read the report; the driver may no longer edit it after that. */
    leadReadAt: timestamp('lead_read_at', { withTimezone: true }),
    leadReadBy: integer('lead_read_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('drive_reports_set_idx').on(t.setId),
    index('drive_reports_driver_idx').on(t.driverId),
    check('drive_reports_safety_check', oneOf(t.safety, SAFETY_STATES)),
    check('drive_reports_surface_check', oneOf(t.surface, SURFACE_IDS)),
    check('drive_reports_load_case_check', oneOf(t.loadCase, LOAD_CASE_IDS)),
  ],
)

export const driveLogs = pgTable(
  'drive_logs',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    reportId: integer('report_id')
      .notNull()
      .references(() => driveReports.id),
    /** Chosen by the server, never by the client. */
    objectKey: text('object_key').notNull(),
    fileName: text('file_name').notNull(),
    sizeBytes: bigint('size_bytes', { mode: 'number' }).notNull(),
    /** uploaded → analysing → done | failed */
    status: text('status').$type<LogStatus>().notNull().default('uploaded'),
    progressBytes: bigint('progress_bytes', { mode: 'number' }).notNull().default(0),
    errorMessage: text('error_message'),
    mapping: jsonb('mapping').$type<Record<string, string>>().notNull().default({}),
    /** The analyser's result, stored as JSON (non-finite numbers come back as null). */
    analysis: jsonb('analysis').$type<AnalysisResult>(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    analysedAt: timestamp('analysed_at', { withTimezone: true }),
    /** The analysis job: which worker holds it and until when; an expired lease lets any server take it over. */
    claimedBy: text('claimed_by'),
    leaseUntil: timestamp('lease_until', { withTimezone: true }),
    attempts: integer('attempts').notNull().default(0),
  },
  (t) => [
    uniqueIndex('drive_logs_object_key_idx').on(t.objectKey),
    index('drive_logs_report_idx').on(t.reportId),
    check('drive_logs_status_check', oneOf(t.status, LOG_STATUSES)),
    index('drive_logs_jobs_idx').on(t.status, t.leaseUntil),
  ],
)

export const reportComments = pgTable(
  'report_comments',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    reportId: integer('report_id')
      .notNull()
      .references(() => driveReports.id),
    authorId: integer('author_id')
      .notNull()
      .references(() => users.id),
    body: text('body').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('report_comments_report_idx').on(t.reportId)],
)

/** Every state change of a revision: who moved it, from what to what, and why. */
export const revisionEvents = pgTable(
  'revision_events',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    revisionId: integer('revision_id')
      .notNull()
      .references(() => mapRevisions.id),
    actorId: integer('actor_id')
      .notNull()
      .references(() => users.id),
    action: text('action').$type<ReviewAction>().notNull(),
    fromState: text('from_state').$type<RevisionState>().notNull(),
    toState: text('to_state').$type<RevisionState>().notNull(),
    comment: text('comment').notNull().default(''),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('revision_events_revision_idx').on(t.revisionId),
    check('revision_events_action_check', oneOf(t.action, REVIEW_ACTIONS)),
    check('revision_events_from_state_check', oneOf(t.fromState, REVISION_STATES)),
    check('revision_events_to_state_check', oneOf(t.toState, REVISION_STATES)),
  ],
)

/** Review comments on a revision, optionally pinned to one cell. */
export const reviewComments = pgTable(
  'review_comments',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    revisionId: integer('revision_id')
      .notNull()
      .references(() => mapRevisions.id),
    authorId: integer('author_id')
      .notNull()
      .references(() => users.id),
    row: integer('row'),
    col: integer('col'),
    body: text('body').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('review_comments_revision_idx').on(t.revisionId)],
)

/**
 * What one truck is flashed with: a drive map revision, a regen map revision and the parameter
 * version of the same program they are judged with. Immutable (a trigger refuses changes):
 * changing anything makes a new set. More controller parts join later as more columns, each
 * also written into parts_key, which makes one combination one set.
 */
export const mapSets = pgTable(
  'map_sets',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    programId: integer('program_id')
      .notNull()
      .references(() => vehiclePrograms.id),
    /** Per-program sequence number, 1, 2, 3 … */
    number: integer('number').notNull(),
    /** Null only in sets the 0006 migration made from data older than sets, where the program had no map of that kind. */
    driveRevisionId: integer('drive_revision_id').references(() => mapRevisions.id),
    regenRevisionId: integer('regen_revision_id').references(() => mapRevisions.id),
    paramVersionId: integer('param_version_id')
      .notNull()
      .references(() => paramVersions.id),
    /** The ramp limits the set runs with; null in sets made before ramps were a part (the controller's own then). */
    rampVersionId: integer('ramp_version_id').references(() => rampVersions.id),
    /** "d<drive id>:r<regen id>:p<param version id>[:q<ramp version id>]": one row per combination. */
    partsKey: text('parts_key').notNull(),
    note: text('note').notNull().default(''),
    createdBy: integer('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('map_sets_program_number_idx').on(t.programId, t.number),
    uniqueIndex('map_sets_parts_idx').on(t.programId, t.partsKey),
    check('map_sets_has_a_map', sql`${t.driveRevisionId} is not null or ${t.regenRevisionId} is not null`),
  ],
)

/**
 * A set released to a program's vehicles. The package is built once at release and its bytes
 * kept in object storage; the row keeps their SHA-256, and a trigger refuses any change to what
 * was released (only retiring and withdrawing are recorded later). At most one current per program.
 */
export const setReleases = pgTable(
  'set_releases',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    setId: integer('set_id')
      .notNull()
      .references(() => mapSets.id),
    programId: integer('program_id')
      .notNull()
      .references(() => vehiclePrograms.id),
    releasedBy: integer('released_by')
      .notNull()
      .references(() => users.id),
    releasedAt: timestamp('released_at', { withTimezone: true }).notNull().defaultNow(),
    acknowledgements: jsonb('acknowledgements').$type<AcknowledgementRecord[]>().notNull().default([]),
    /** Release conditions without a covering drive report, waived by the lead with a reason (none in older releases). */
    coverageWaivers: jsonb('coverage_waivers').$type<CoverageWaiverRecord[]>().notNull().default([]),
    /** Object key, file name, size and SHA-256 of the frozen package; null only for releases older than frozen packages. */
    packageKey: text('package_key'),
    packageName: text('package_name'),
    packageBytes: integer('package_bytes'),
    packageSha256: text('package_sha256'),
    manifest: jsonb('manifest').$type<Record<string, unknown>>(),
    retiredAt: timestamp('retired_at', { withTimezone: true }),
    withdrawnAt: timestamp('withdrawn_at', { withTimezone: true }),
    withdrawnBy: integer('withdrawn_by').references(() => users.id),
    withdrawReason: text('withdraw_reason'),
  },
  (t) => [
    index('set_releases_set_idx').on(t.setId),
    uniqueIndex('set_releases_one_current_per_program_idx').on(t.programId).where(sql`${t.retiredAt} is null and ${t.withdrawnAt} is null`),
  ],
)

/** Outgoing e-mail, written in the same transaction as the change it reports, then sent with retries. */
export const mailOutbox = pgTable(
  'mail_outbox',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    to: jsonb('to').$type<string[]>().notNull(),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    status: text('status').$type<MailStatus>().notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    nextAttemptAt: timestamp('next_attempt_at', { withTimezone: true }).notNull().defaultNow(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
  },
  (t) => [index('mail_outbox_status_idx').on(t.status, t.nextAttemptAt), check('mail_outbox_status_check', oneOf(t.status, MAIL_STATUSES))],
)

/** One-time links (invite, password reset): only a hash of the token is stored. */
export const authTokens = pgTable(
  'auth_tokens',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id),
    kind: text('kind').$type<LinkKind>().notNull(),
    tokenHash: text('token_hash').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('auth_tokens_hash_idx').on(t.tokenHash), check('auth_tokens_kind_check', oneOf(t.kind, LINK_KINDS))],
)

/**
 * Sessions ended by signing out, by the session id in the token. Kept until every token of that
 * session has expired (the sign-out time plus the session lifetime), then pruned.
 */
export const revokedSessions = pgTable(
  'revoked_sessions',
  {
    sid: text('sid').primaryKey(),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
  },
  (t) => [index('revoked_sessions_expires_idx').on(t.expiresAt)],
)

/**
 * A creation a person may send twice (a dropped connection, a reload that restores the draft): the
 * client's key (the draft's id) per user and kind of creation, what the first request created, and
 * a hash of its content. Written in the creation's own transaction; the unique index lets only one
 * of two concurrent repeats create.
 */
export const idempotencyKeys = pgTable(
  'idempotency_keys',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id),
    /** What the key created: report, report-comment, review-comment, revision. */
    scope: text('scope').notNull(),
    key: text('key').notNull(),
    requestHash: text('request_hash').notNull(),
    /** The id of the created row (set in the same transaction as the claim). */
    resultId: integer('result_id'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('idempotency_keys_user_scope_key_idx').on(t.userId, t.scope, t.key)],
)

/**
 * Counted events for limits that must hold across every app server (failed sign-ins, password-reset
 * requests): one row per event and key, counted over a sliding window and pruned once older than it.
 */
export const rateEvents = pgTable(
  'rate_events',
  {
    // bigint: rows come and go fast and ids are never reused.
    id: bigint('id', { mode: 'number' }).primaryKey().generatedAlwaysAsIdentity(),
    /** What is counted and for whom: a scope and a digest of the key, e.g. "sign-in-fail:<sha-256>" (rateKey). */
    key: text('key').notNull(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('rate_events_key_at_idx').on(t.key, t.at), index('rate_events_at_idx').on(t.at)],
)

import { relations, sql } from 'drizzle-orm'
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
} from 'drizzle-orm/pg-core'
import type { VehicleParams } from '../physics/vehicle'

import { ROLES, type Role } from './roles'

export { ROLES, type Role }

/** What a revision's stored table holds (the `maps/` MapTable shape). */
export interface StoredTable {
  kind: 'drive' | 'regen'
  rowAxis: number[]
  colAxis: number[]
  values: number[][]
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
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('users_email_lower_idx').on(sql`lower(${t.email})`),
    check('users_role_check', sql`${t.role} in ('admin', 'lead_engineer', 'calibration_engineer', 'test_driver')`),
  ],
)

export const vehiclePrograms = pgTable(
  'vehicle_programs',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    name: text('name').notNull(),
    description: text('description').notNull().default(''),
    params: jsonb('params').$type<VehicleParams>().notNull(),
    createdBy: integer('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('vehicle_programs_name_idx').on(sql`lower(${t.name})`)],
)

export const maps = pgTable(
  'maps',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    programId: integer('program_id')
      .notNull()
      .references(() => vehiclePrograms.id),
    name: text('name').notNull(),
    kind: text('kind').$type<'drive' | 'regen'>().notNull(),
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
    table: jsonb('table').$type<StoredTable>().notNull(),
    checksum: text('checksum').notNull(),
    state: text('state').notNull().default('draft'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('map_revisions_map_number_idx').on(t.mapId, t.number),
    index('map_revisions_map_created_idx').on(t.mapId, t.createdAt),
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
  pedalPct: number
  speedKmh: number
  what: string
  severity: 1 | 2 | 3 | 4
}

export const driveReports = pgTable(
  'drive_reports',
  {
    id: integer('id').primaryKey().generatedAlwaysAsIdentity(),
    revisionId: integer('revision_id')
      .notNull()
      .references(() => mapRevisions.id),
    driverId: integer('driver_id')
      .notNull()
      .references(() => users.id),
    drivenOn: date('driven_on').notNull(),
    vehicleUnit: text('vehicle_unit').notNull(),
    route: text('route').notNull(),
    surface: text('surface').notNull(),
    weather: text('weather').notNull(),
    ambientC: real('ambient_c').notNull(),
    loadCase: text('load_case').notNull(),
    payloadKg: real('payload_kg').notNull(),
    trailer: boolean('trailer').notNull(),
    ratings: jsonb('ratings').$type<ReportRatings>().notNull(),
    comments: text('comments').notNull().default(''),
    flags: jsonb('flags').$type<ReportFlag[]>().notNull().default([]),
    /** none | open | resolved: a severity-4 flag opens it; only a lead engineer closes it, with a comment. */
    safety: text('safety').$type<'none' | 'open' | 'resolved'>().notNull().default('none'),
    safetyResolvedBy: integer('safety_resolved_by').references(() => users.id),
    safetyResolvedAt: timestamp('safety_resolved_at', { withTimezone: true }),
    safetyResolution: text('safety_resolution'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('drive_reports_revision_idx').on(t.revisionId),
    index('drive_reports_driver_idx').on(t.driverId),
    check('drive_reports_safety_check', sql`${t.safety} in ('none', 'open', 'resolved')`),
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
    status: text('status').notNull().default('uploaded'),
    progressBytes: bigint('progress_bytes', { mode: 'number' }).notNull().default(0),
    errorMessage: text('error_message'),
    mapping: jsonb('mapping').$type<Record<string, string>>().notNull().default({}),
    analysis: jsonb('analysis').$type<Record<string, unknown>>(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    analysedAt: timestamp('analysed_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('drive_logs_object_key_idx').on(t.objectKey), index('drive_logs_report_idx').on(t.reportId)],
)

export const usersRelations = relations(users, ({ many }) => ({ revisions: many(mapRevisions) }))
export const programsRelations = relations(vehiclePrograms, ({ many }) => ({ maps: many(maps) }))
export const mapsRelations = relations(maps, ({ one, many }) => ({
  program: one(vehiclePrograms, { fields: [maps.programId], references: [vehiclePrograms.id] }),
  revisions: many(mapRevisions),
}))
export const revisionsRelations = relations(mapRevisions, ({ one }) => ({
  map: one(maps, { fields: [mapRevisions.mapId], references: [maps.id] }),
  author: one(users, { fields: [mapRevisions.authorId], references: [users.id] }),
}))

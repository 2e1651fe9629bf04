import { relations, sql } from 'drizzle-orm'
import {
  boolean,
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

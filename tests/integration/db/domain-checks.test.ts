import { describe, expect, it } from 'vitest'
import { sql } from 'drizzle-orm'
import { z } from 'zod'
import { getDb } from '@/db/client'
import { LINK_KINDS } from '@/domain/one-time-links'
import { LOG_STATUSES } from '@/domain/log-statuses'
import { MAIL_STATUSES } from '@/domain/mail-statuses'
import { SAFETY_STATES } from '@/domain/report-safety'
import { REVIEW_ACTIONS } from '@/domain/review-actions'
import { REVISION_STATES } from '@/domain/revision-states'
import { ROLES } from '@/domain/roles'
import { LOAD_CASE_IDS } from '@/physics/load-cases'
import { SURFACE_IDS } from '@/physics/surfaces'
import { programAndMap } from '@/tests/support/fixtures'

// Every persisted id set has a CHECK built from its constant: the database holds exactly the ids the code knows.
const CHECKS: [name: string, ids: readonly string[]][] = [
  ['users_role_check', ROLES],
  ['map_revisions_state_check', REVISION_STATES],
  ['revision_events_action_check', REVIEW_ACTIONS],
  ['revision_events_from_state_check', REVISION_STATES],
  ['revision_events_to_state_check', REVISION_STATES],
  ['drive_reports_safety_check', SAFETY_STATES],
  ['drive_reports_surface_check', SURFACE_IDS],
  ['drive_reports_load_case_check', LOAD_CASE_IDS],
  ['drive_logs_status_check', LOG_STATUSES],
  ['mail_outbox_status_check', MAIL_STATUSES],
  ['auth_tokens_kind_check', LINK_KINDS],
]

// The raw-query result shape differs between the two drivers' types; both carry `rows`.
const rowsOf = <T extends z.ZodType>(row: T, result: unknown) => z.object({ rows: z.array(row) }).parse(result)

describe('CHECK constraints derived from the domain constants', () => {
  it.each(CHECKS)('%s lists exactly the ids of its constant', async (name, ids) => {
    const db = await getDb()
    const { rows } = rowsOf(z.object({ def: z.string() }), await db.execute(sql`select pg_get_constraintdef(oid) as def from pg_constraint where conname = ${name}`))
    expect(rows).toHaveLength(1)
    const listed = [...rows[0].def.matchAll(/'([^']*)'/g)].map((m) => m[1])
    expect([...listed].sort()).toEqual([...ids].sort())
  })

  it('refuses an unknown mail status and an unknown revision event action', async () => {
    const db = await getDb()
    await expect(db.execute(sql`insert into mail_outbox ("to", subject, text, status) values ('[]'::jsonb, 's', 't', 'bounced')`)).rejects.toThrow()
    const { mapId, engineer } = await programAndMap()
    const [rev] = rowsOf(z.object({ id: z.number() }), await db.execute(sql`select id from map_revisions where map_id = ${mapId}`)).rows
    const insertEvent = (action: string) =>
      db.execute(sql`insert into revision_events (revision_id, actor_id, action, from_state, to_state) values (${rev.id}, ${engineer.id}, ${action}, 'draft', 'in_review')`)
    await expect(insertEvent('publish')).rejects.toThrow()
    await expect(insertEvent('submit')).resolves.toBeDefined()
  })
})

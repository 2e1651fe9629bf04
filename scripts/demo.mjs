// Demo: migrate, load the invented demo scenario (idempotent), then serve the app on 127.0.0.1:3000.
import { bin, buildIfStale, run } from './lib.mjs'

await buildIfStale()
const env = { ...process.env, MAPWRIGHT_DEMO: '1' }
const seeded = await run(bin('tsx'), ['scripts/seed.ts'], { env })
if (seeded !== 0) process.exit(seeded)
process.exit(await run(process.execPath, ['scripts/start.mjs'], { env }))

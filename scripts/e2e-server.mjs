// The server e2e tests run against: the production build on a fresh PGlite folder with the demo
// data, with its own fake S3 and mail capture on free ports.
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { bin, buildIfStale, run } from './lib.mjs'
import { startLocalServices } from './local-services.mjs'

const port = process.argv[2] ?? '3100'
const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'mapwright-e2e-'))
delete process.env.S3_ENDPOINT
delete process.env.SMTP_URL
const services = await startLocalServices(dataDir, { s3: 0, smtp: 0 })
const env = {
  ...process.env,
  ...services.env,
  PGLITE_DATA_DIR: path.join(dataDir, 'pglite'),
  NEXTAUTH_SECRET: 'e2e-secret-0123456789abcdef',
  NEXTAUTH_URL: `http://127.0.0.1:${port}`,
  MAPWRIGHT_DEMO: '1',
}
delete env.DATABASE_URL
await buildIfStale()
const seeded = await run(bin('tsx'), ['--conditions=react-server', 'scripts/seed.ts'], { env })
if (seeded !== 0) process.exit(seeded)
const code = await run(process.execPath, ['scripts/server.mjs', '-H', '127.0.0.1', '-p', port], { env })
await services.close()
fs.rmSync(dataDir, { recursive: true, force: true })
process.exit(code)

// Start the production server on 127.0.0.1 (PORT, default 3000) with a per-install auth secret and
// the local stand-ins for object storage and e-mail (unless S3_ENDPOINT / SMTP_URL name real ones).
import path from 'node:path'
import { authSecret, buildIfStale, root, run } from './lib.mjs'
import { startLocalServices } from './local-services.mjs'

const port = process.env.PORT ?? '3000'
const host = process.env.HOST ?? '127.0.0.1'
await buildIfStale()
const services = await startLocalServices(process.env.MAPWRIGHT_DATA_DIR ?? path.join(root, '.data'))
const env = {
  ...process.env,
  ...services.env,
  NEXTAUTH_SECRET: authSecret(),
  NEXTAUTH_URL: process.env.NEXTAUTH_URL ?? `http://${host}:${port}`,
}
console.log(`Mapwright on http://${host}:${port}`)
const code = await run(process.execPath, ['scripts/server.mjs', '-H', host, '-p', port], { env })
await services.close()
process.exit(code)

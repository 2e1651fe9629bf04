// Start the production server on 127.0.0.1 (PORT, default 3000) with a per-install auth secret.
import { authSecret, bin, buildIfStale, run } from './lib.mjs'

const port = process.env.PORT ?? '3000'
const host = process.env.HOST ?? '127.0.0.1'
await buildIfStale()
const env = {
  ...process.env,
  NEXTAUTH_SECRET: authSecret(),
  NEXTAUTH_URL: process.env.NEXTAUTH_URL ?? `http://${host}:${port}`,
}
console.log(`Mapwright on http://${host}:${port}`)
process.exit(await run(bin('next'), ['start', '-H', host, '-p', port], { env }))

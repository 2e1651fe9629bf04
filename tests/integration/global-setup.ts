// Once per integration run: a fake S3 server and a mail capture server on free 127.0.0.1 ports,
// with their addresses put in the environment the test workers inherit.
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { startLocalServices } from '../../scripts/local-services.mjs'

export default async function setup() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'mapwright-it-'))
  delete process.env.S3_ENDPOINT
  delete process.env.SMTP_URL
  const services = await startLocalServices(dir, { s3: 0, smtp: 0 })
  Object.assign(process.env, services.env)
  // A small upload limit keeps the oversize tests fast; the product default is 200 MB.
  process.env.LOG_MAX_BYTES = String(5 * 1024 * 1024)
  return async () => {
    await services.close()
    fs.rmSync(dir, { recursive: true, force: true })
  }
}

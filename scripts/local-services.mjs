// Local stand-ins the app uses by default: a fake S3 server (s3rver) for drive logs and an SMTP
// capture server for e-mail, both on 127.0.0.1 only. Start them from a script with startLocalServices().
import fs from 'node:fs'
import http from 'node:http'
import path from 'node:path'
import S3rver from 's3rver'
import { SMTPServer } from 'smtp-server'
import { s3Gate, sweepStaleUploads } from './s3-gate.mjs'

export const S3_DEFAULTS = { bucket: 'mapwright-logs', accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' }

/**
 * Start the fake S3 server on 127.0.0.1:port (0 = any free port) storing under dir; returns its URL.
 * s3rver answers only through the gate of s3-gate.mjs: signed requests only, aborted multipart
 * uploads removed (see docs/security.md for what the stand-in guarantees).
 */
export async function startFakeS3(dir, port = 4569) {
  fs.mkdirSync(dir, { recursive: true })
  const s3rver = new S3rver({ directory: dir, silent: true, configureBuckets: [{ name: S3_DEFAULTS.bucket }] })
  await s3rver.configureBuckets()
  sweepStaleUploads(dir, S3_DEFAULTS.bucket)
  const sweep = setInterval(() => sweepStaleUploads(dir, S3_DEFAULTS.bucket), 60 * 60 * 1000).unref()
  const server = http.createServer(s3Gate({ root: dir, creds: S3_DEFAULTS, next: s3rver.callback() }))
  await new Promise((resolve, reject) => {
    server.once('error', reject)
    server.listen(port, '127.0.0.1', resolve)
  })
  const close = () =>
    new Promise((resolve) => {
      clearInterval(sweep)
      server.closeAllConnections()
      server.close(() => resolve())
    })
  return { url: `http://127.0.0.1:${server.address().port}`, close }
}

/**
 * Start an SMTP server on 127.0.0.1:port that accepts every message and appends it (raw RFC 5322
 * text plus envelope) as one JSON line to `outboxFile`, where the admin outbox page reads it.
 */
export async function startMailCapture(outboxFile, port = 2525) {
  fs.mkdirSync(path.dirname(outboxFile), { recursive: true })
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      const chunks = []
      stream.on('data', (c) => chunks.push(c))
      stream.on('end', () => {
        const entry = {
          receivedAt: new Date().toISOString(),
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
          raw: Buffer.concat(chunks).toString('utf8'),
        }
        fs.appendFileSync(outboxFile, JSON.stringify(entry) + '\n')
        callback()
      })
    },
  })
  await new Promise((resolve, reject) => {
    server.once('error', reject)
    server.listen(port, '127.0.0.1', resolve)
  })
  // A client that drops its connection (a test worker ending mid-send) must not bring the server down.
  server.removeAllListeners('error')
  server.on('error', (e) => {
    if (e.code !== 'ECONNRESET' && e.code !== 'EPIPE') console.error('mail capture:', e.message)
  })
  const actual = server.server.address().port
  return { url: `smtp://127.0.0.1:${actual}`, close: () => new Promise((r) => server.close(r)) }
}

/**
 * Start whichever stand-ins the environment does not replace, and return the variables that point
 * the app at them. S3_ENDPOINT or SMTP_URL set means a real service is configured.
 */
export async function startLocalServices(dataDir, ports = {}) {
  const env = {}
  const closers = []
  if (!process.env.S3_ENDPOINT) {
    const s3 = await startFakeS3(path.join(dataDir, 's3'), ports.s3 ?? 4569)
    Object.assign(env, { S3_ENDPOINT: s3.url, S3_BUCKET: S3_DEFAULTS.bucket, S3_ACCESS_KEY_ID: S3_DEFAULTS.accessKeyId, S3_SECRET_ACCESS_KEY: S3_DEFAULTS.secretAccessKey, S3_FORCE_PATH_STYLE: '1' })
    closers.push(s3.close)
    console.log(`Fake S3 (local stand-in) on ${s3.url}, files under ${path.join(dataDir, 's3')}`)
  }
  if (!process.env.SMTP_URL) {
    const outbox = path.join(dataDir, 'outbox.jsonl')
    const smtp = await startMailCapture(outbox, ports.smtp ?? 2525)
    Object.assign(env, { SMTP_URL: smtp.url, MAIL_OUTBOX_FILE: outbox })
    closers.push(smtp.close)
    console.log(`Mail capture (local stand-in) on ${smtp.url}, outbox ${outbox}`)
  }
  return { env, close: () => Promise.all(closers.map((c) => c())) }
}

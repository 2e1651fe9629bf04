// Uploads that end badly (refused as too large, or dropped by the client half-way) must leave the
// object store's folder exactly as it was, with no multipart parts behind and no uncaught error;
// and the local S3 stand-in serves and stores nothing for a request that is not properly signed.
// This file runs its own stand-in on a folder of its own, so other test files cannot change its size.
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3'
import { S3_DEFAULTS, startFakeS3 } from '../../../scripts/local-services.mjs'
import * as logsRoute from '@/app/api/reports/[id]/logs/route'
import { filedReport } from '@/tests/support/report-fixtures'
import { getLog } from '@/db/queries/logs'

const MB = 1024 * 1024
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'mw-upload-'))
const s3dir = path.join(dir, 's3')
let s3: { url: string; close: () => Promise<void> }
const uncaught: unknown[] = []
const onUncaught = (e: unknown) => uncaught.push(e)

beforeAll(async () => {
  s3 = await startFakeS3(s3dir, 0)
  // Read once by the app's env() and S3 client, which no request of this file has built yet.
  Object.assign(process.env, { S3_ENDPOINT: s3.url, LOG_MAX_BYTES: String(20 * MB) })
  process.on('uncaughtException', onUncaught)
  process.on('unhandledRejection', onUncaught)
})
afterAll(async () => {
  process.off('uncaughtException', onUncaught)
  process.off('unhandledRejection', onUncaught)
  await s3.close()
  fs.rmSync(dir, { recursive: true, force: true })
})

/** Every file under the stand-in's folder, with its size. */
function files(p: string): { file: string; size: number }[] {
  if (!fs.existsSync(p)) return []
  return fs.readdirSync(p, { withFileTypes: true }).flatMap((e) => {
    const f = path.join(p, e.name)
    return e.isDirectory() ? files(f) : [{ file: path.relative(s3dir, f), size: fs.statSync(f).size }]
  })
}
const folderBytes = () => files(s3dir).reduce((n, f) => n + f.size, 0)

/** A CSV body of `mb` megabytes streamed with no declared length; `failAt` drops the connection there. */
function csvStream(mb: number, failAt?: number) {
  const line = new TextEncoder().encode('1,2,3,4\n'.repeat(8192)) // 64 KiB
  let sent = 0
  return new ReadableStream<Uint8Array>({
    start(c) {
      c.enqueue(new TextEncoder().encode('time_s,road_speed_kmh,wheel_speed_kmh,accel_pedal_pct\n'))
    },
    pull(c) {
      if (failAt !== undefined && sent >= failAt * MB) return c.error(new Error('the client went away'))
      if (sent >= mb * MB) return c.close()
      sent += line.length
      c.enqueue(line)
    },
  })
}

async function upload(reportId: number, cookie: string, body: ReadableStream<Uint8Array>) {
  const req = new Request(`http://127.0.0.1:3000/api/reports/${reportId}/logs?name=log.csv`, { method: 'POST', headers: { cookie, 'content-type': 'text/csv' }, body, duplex: 'half' } as RequestInit)
  const res = await logsRoute.POST(req, { params: Promise.resolve({ id: String(reportId) }) })
  return { status: res.status, body: await res.json() }
}

/** The folder settles once the upload's clean-up has run; give it a moment, then compare. */
async function settledBytes(expected: number) {
  for (let i = 0; i < 40 && folderBytes() !== expected; i++) await new Promise((r) => setTimeout(r, 50))
  return folderBytes()
}

describe('uploads that end badly', () => {
  it('a file refused as too large (413) after several parts were stored leaves the folder as it was', async () => {
    const { reportId, driverCookie } = await filedReport()
    const before = folderBytes()
    // 30 MB against a 20 MB limit: two 8 MB parts reach the store before the guard refuses the rest.
    const res = await upload(reportId, driverCookie, csvStream(30))
    expect(res.status).toBe(413)
    expect(await settledBytes(before)).toBe(before)
    expect(files(s3dir).filter((f) => f.file.includes('uploads'))).toEqual([])
    expect(uncaught).toEqual([])
  })

  it('an upload the client drops half-way leaves the folder as it was, with a clear answer and no uncaught error', async () => {
    const { reportId, driverCookie } = await filedReport()
    const before = folderBytes()
    const res = await upload(reportId, driverCookie, csvStream(30, 17))
    expect(res.status).toBe(400)
    expect(res.body.error.message).toMatch(/interrupted/)
    expect(await settledBytes(before)).toBe(before)
    expect(files(s3dir).filter((f) => f.file.includes('uploads'))).toEqual([])
    await new Promise((r) => setTimeout(r, 200))
    expect(uncaught).toEqual([])
  })

  it('a whole file still arrives and is kept', async () => {
    const { reportId, driverCookie } = await filedReport()
    const res = await upload(reportId, driverCookie, csvStream(9))
    expect(res.status).toBe(201)
    expect(files(s3dir).some((f) => f.size === res.body.log.sizeBytes)).toBe(true)
    // No log worker runs in this file, so nothing reads the file after the stand-in closes: it waits, uploaded.
    expect((await getLog(res.body.log.id))?.status).toBe('uploaded')
  })
})

describe('the local S3 stand-in', () => {
  const objectUrl = (key: string) => `${s3.url}/${S3_DEFAULTS.bucket}/${key}`
  const client = (secretAccessKey: string) =>
    new S3Client({ region: 'us-east-1', endpoint: s3.url, forcePathStyle: true, credentials: { accessKeyId: S3_DEFAULTS.accessKeyId, secretAccessKey } })

  it('stores and serves nothing for an unsigned request', async () => {
    const put = await fetch(objectUrl('unsigned.txt'), { method: 'PUT', body: 'planted' })
    expect(put.status).toBe(403)
    expect(files(s3dir).some((f) => f.file.includes('unsigned'))).toBe(false)
    // An object the app stored is not readable without a signature either.
    await client(S3_DEFAULTS.secretAccessKey).send(new PutObjectCommand({ Bucket: S3_DEFAULTS.bucket, Key: 'signed.txt', Body: 'kept' }))
    const get = await fetch(objectUrl('signed.txt'))
    expect(get.status).toBe(403)
    expect(await get.text()).not.toContain('kept')
    expect((await fetch(`${s3.url}/${S3_DEFAULTS.bucket}`)).status).toBe(403) // no listing either
  })

  it('refuses a request signed with the wrong secret, and serves one signed with the right one', async () => {
    await expect(client('not-the-secret').send(new GetObjectCommand({ Bucket: S3_DEFAULTS.bucket, Key: 'signed.txt' }))).rejects.toThrow()
    await expect(client('not-the-secret').send(new PutObjectCommand({ Bucket: S3_DEFAULTS.bucket, Key: 'forged.txt', Body: 'x' }))).rejects.toThrow()
    expect(files(s3dir).some((f) => f.file.includes('forged'))).toBe(false)
    const ok = await client(S3_DEFAULTS.secretAccessKey).send(new GetObjectCommand({ Bucket: S3_DEFAULTS.bucket, Key: 'signed.txt' }))
    expect(await ok.Body?.transformToString()).toBe('kept')
  })
})

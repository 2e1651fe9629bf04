// Object storage for drive logs (S3 API). The demo seed also stores logs, under tsx --conditions=react-server.
import 'server-only'
import { Readable } from 'node:stream'
import { DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, HeadObjectCommand, S3Client } from '@aws-sdk/client-s3'
import { Upload } from '@aws-sdk/lib-storage'
import { env } from '../config/env'

// One client per process, like the database.
const key = Symbol.for('mapwright.s3')
type G = typeof globalThis & { [key]?: S3Client }

function client(): S3Client {
  const g = globalThis as G
  if (!g[key]) {
    const e = env()
    if (!e.S3_ENDPOINT && !process.env.AWS_REGION) throw new Error('Object storage is not configured: set S3_ENDPOINT (npm run start starts a local one)')
    g[key] = new S3Client({
      region: e.S3_REGION,
      endpoint: e.S3_ENDPOINT,
      // The local fake (s3rver) only speaks path-style URLs.
      forcePathStyle: e.S3_FORCE_PATH_STYLE === '1',
      credentials: e.S3_ACCESS_KEY_ID && e.S3_SECRET_ACCESS_KEY ? { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY } : undefined,
    })
  }
  return g[key]!
}

const bucket = () => env().S3_BUCKET

/** Stream a body into storage under `objectKey` (multipart, so memory stays bounded). */
export async function putObjectStream(objectKey: string, body: Readable, contentType: string): Promise<void> {
  const upload = new Upload({ client: client(), params: { Bucket: bucket(), Key: objectKey, Body: body, ContentType: contentType }, queueSize: 2, partSize: 8 * 1024 * 1024 })
  await upload.done()
}

/** A stored object as a Node stream. */
export async function getObjectStream(objectKey: string): Promise<Readable> {
  const res = await client().send(new GetObjectCommand({ Bucket: bucket(), Key: objectKey }))
  if (!(res.Body instanceof Readable)) throw new Error(`Object ${objectKey} has no readable body`)
  return res.Body
}

export async function objectSize(objectKey: string): Promise<number | null> {
  try {
    const res = await client().send(new HeadObjectCommand({ Bucket: bucket(), Key: objectKey }))
    return res.ContentLength ?? null
  } catch {
    return null
  }
}

export async function deleteObject(objectKey: string): Promise<void> {
  await client().send(new DeleteObjectCommand({ Bucket: bucket(), Key: objectKey }))
}

/** Does the store answer for our bucket? (The health route; throws with the store's reason when not.) */
export async function storageAnswers(): Promise<void> {
  await client().send(new HeadBucketCommand({ Bucket: bucket() }))
}

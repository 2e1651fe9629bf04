// A gate in front of the local S3 stand-in (s3rver), for what s3rver itself does not do:
// - it accepts unsigned requests and never checks an AWS Signature V4, so anyone who can reach the
//   port could read or plant drive logs: the gate answers 403 unless the request carries a valid
//   SigV4 Authorization header made with the configured key (method, path, query, signed headers
//   and the time, within 15 minutes; the body is not hashed again, it is taken as declared);
// - it has no AbortMultipartUpload, so the parts of a refused or failed upload stayed on disk for
//   ever: the gate removes them, and sweeps uploads left unfinished for a day (a crashed client);
// - its part upload waits for ever on a client that drops the connection, with the part file open:
//   the gate stores parts itself, through stream.pipeline, which closes and removes a partial part.
import crypto from 'node:crypto'
import fs from 'node:fs'
import path from 'node:path'
import { Transform } from 'node:stream'
import { pipeline } from 'node:stream/promises'

const MAX_SKEW_MS = 15 * 60 * 1000
const STALE_UPLOAD_MS = 24 * 60 * 60 * 1000
/** Where s3rver's filesystem store keeps unfinished multipart uploads of a bucket. */
const uploadsDir = (root, bucket) => path.join(root, bucket, '._S3rver_uploads')

const sha256 = (s) => crypto.createHash('sha256').update(s).digest('hex')
const hmac = (key, s) => crypto.createHmac('sha256', key).update(s).digest()
/** RFC 3986 encoding, as SigV4 wants for query keys and values. */
const enc = (s) => encodeURIComponent(s).replace(/[!'()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`)
const dec = (s) => {
  try {
    return decodeURIComponent(s)
  } catch {
    return s
  }
}

function canonicalQuery(raw) {
  const pairs = raw.split('&').filter(Boolean).map((p) => {
    const i = p.indexOf('=')
    return [enc(dec(i < 0 ? p : p.slice(0, i))), enc(dec(i < 0 ? '' : p.slice(i + 1)))]
  })
  pairs.sort(([a, av], [b, bv]) => (a < b ? -1 : a > b ? 1 : av < bv ? -1 : av > bv ? 1 : 0))
  return pairs.map(([k, v]) => `${k}=${v}`).join('&')
}

const headerValue = (req, name) => {
  const v = req.headers[name]
  return (Array.isArray(v) ? v.join(',') : (v ?? '')).trim().replace(/\s+/g, ' ')
}

/** null when `req` carries a valid SigV4 signature made with `creds`; else why not. */
export function signatureProblem(req, creds, now = Date.now()) {
  const auth = req.headers.authorization
  if (!auth) return 'The request is not signed'
  const m = /^AWS4-HMAC-SHA256 Credential=([^,\s]+),\s*SignedHeaders=([^,\s]+),\s*Signature=([0-9a-f]{64})$/.exec(auth)
  if (!m) return 'The Authorization header is not an AWS Signature V4'
  const [accessKeyId, date, region, service, term, ...rest] = m[1].split('/')
  if (accessKeyId !== creds.accessKeyId || service !== 's3' || term !== 'aws4_request' || rest.length) return 'Unknown access key or credential scope'
  const amzDate = headerValue(req, 'x-amz-date')
  const t = /^(\d{4})(\d{2})(\d{2})T(\d{2})(\d{2})(\d{2})Z$/.exec(amzDate)
  if (!t || amzDate.slice(0, 8) !== date) return 'Missing or inconsistent x-amz-date'
  if (Math.abs(now - Date.UTC(+t[1], +t[2] - 1, +t[3], +t[4], +t[5], +t[6])) > MAX_SKEW_MS) return 'The request time is too far from the server time'
  const signed = m[2].split(';')
  if (!signed.includes('host') || !signed.includes('x-amz-date')) return 'host and x-amz-date must be signed'
  const payloadHash = headerValue(req, 'x-amz-content-sha256')
  if (!payloadHash) return 'Missing x-amz-content-sha256'
  const q = req.url.indexOf('?')
  const canonical = [
    req.method,
    q < 0 ? req.url : req.url.slice(0, q),
    canonicalQuery(q < 0 ? '' : req.url.slice(q + 1)),
    signed.map((h) => `${h}:${headerValue(req, h)}\n`).join(''),
    signed.join(';'),
    payloadHash,
  ].join('\n')
  const scope = `${date}/${region}/${service}/aws4_request`
  const key = ['aws4_request'].reduce(hmac, hmac(hmac(hmac(`AWS4${creds.secretAccessKey}`, date), region), service))
  const expected = hmac(key, ['AWS4-HMAC-SHA256', amzDate, scope, sha256(canonical)].join('\n')).toString('hex')
  return crypto.timingSafeEqual(Buffer.from(expected), Buffer.from(m[3])) ? null : 'The signature does not match'
}

function xmlError(res, status, code, message) {
  if (res.headersSent) return res.destroy()
  const body = `<?xml version="1.0" encoding="UTF-8"?>\n<Error><Code>${code}</Code><Message>${message}</Message></Error>`
  res.writeHead(status, { 'content-type': 'application/xml', 'content-length': Buffer.byteLength(body), connection: 'close' })
  res.end(body)
}

/** Answer with an error without reading the body (drained, so the connection can close cleanly). */
function refuse(req, res, status, code, message) {
  req.resume()
  xmlError(res, status, code, message)
}

/** The multipart upload a request names, when its bucket and id are well formed and it exists. */
function uploadOf(root, url) {
  const [, bucket] = /^\/([a-z0-9][a-z0-9.-]{1,61}[a-z0-9])\//.exec(url.pathname) ?? []
  const id = url.searchParams.get('uploadId') ?? ''
  if (!bucket || !/^[0-9a-f]{32}$/.test(id)) return null
  const dir = path.join(uploadsDir(root, bucket), id)
  return fs.existsSync(dir) ? dir : null
}

async function putPart(dir, partNumber, req, res) {
  const part = path.join(dir, String(partNumber))
  const partial = `${part}.partial`
  const md5 = crypto.createHash('md5')
  const hash = new Transform({
    transform(chunk, _enc, cb) {
      md5.update(chunk)
      cb(null, chunk)
    },
  })
  try {
    await pipeline(req, hash, fs.createWriteStream(partial))
    const etag = md5.digest('hex')
    fs.renameSync(partial, part)
    fs.writeFileSync(`${part}.md5`, etag)
    res.writeHead(200, { etag: `"${etag}"`, 'content-length': 0 })
    res.end()
  } catch {
    // The client went away mid-part: nothing of it stays.
    fs.rmSync(partial, { force: true })
    xmlError(res, 400, 'IncompleteBody', 'The part was not received whole')
  }
}

/** Remove multipart uploads of `bucket` left unfinished for longer than a day. */
export function sweepStaleUploads(root, bucket, now = Date.now()) {
  const dir = uploadsDir(root, bucket)
  if (!fs.existsSync(dir)) return
  for (const id of fs.readdirSync(dir)) {
    const p = path.join(dir, id)
    if (now - fs.statSync(p).mtimeMs > STALE_UPLOAD_MS) fs.rmSync(p, { recursive: true, force: true })
  }
}

/** A request handler: signed requests reach s3rver (`next`), with aborts and parts handled here. */
export function s3Gate({ root, creds, next }) {
  return (req, res) => {
    // A client that drops its connection mid-request must not become an uncaught 'error'.
    req.on('error', () => {})
    const problem = signatureProblem(req, creds)
    if (problem) return refuse(req, res, 403, 'AccessDenied', problem)
    const url = new URL(req.url, 'http://stand-in')
    if (url.searchParams.has('uploadId') && !req.headers['x-amz-copy-source']) {
      const dir = uploadOf(root, url)
      const partNumber = Number(url.searchParams.get('partNumber'))
      if (req.method === 'DELETE' || (req.method === 'PUT' && url.searchParams.has('partNumber'))) {
        if (!dir) return refuse(req, res, 404, 'NoSuchUpload', 'The specified multipart upload does not exist')
        if (req.method === 'DELETE') {
          fs.rmSync(dir, { recursive: true, force: true })
          res.writeHead(204)
          return res.end()
        }
        if (!Number.isInteger(partNumber) || partNumber < 1 || partNumber > 10000) return refuse(req, res, 400, 'InvalidArgument', 'partNumber must be 1 to 10000')
        return void putPart(dir, partNumber, req, res)
      }
    }
    next(req, res)
  }
}

// The local S3 stand-in's signature rule, against requests signed by the AWS SDK's own SigV4 signer.
import { createHash, createHmac } from 'node:crypto'
import { describe, expect, it } from 'vitest'
import { SignatureV4 } from '@smithy/signature-v4'
import { signatureProblem } from '../../../scripts/s3-gate.mjs'

const creds = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' }

// A SHA-256 for the signer (the SDK's own comes from its runtime config; node:crypto does the same).
type Data = string | ArrayBuffer | ArrayBufferView
const bytes = (d: Data) => (typeof d === 'string' ? Buffer.from(d) : ArrayBuffer.isView(d) ? Buffer.from(d.buffer, d.byteOffset, d.byteLength) : Buffer.from(d))
class Sha256 {
  private parts: Buffer[] = []
  constructor(private readonly secret?: Data) {}
  update(data: Data) {
    this.parts.push(bytes(data))
  }
  async digest() {
    const body = Buffer.concat(this.parts)
    return new Uint8Array(this.secret === undefined ? createHash('sha256').update(body).digest() : createHmac('sha256', bytes(this.secret)).update(body).digest())
  }
}

async function signed(opts: { secret?: string; at?: Date; path?: string; query?: Record<string, string> } = {}) {
  const signer = new SignatureV4({ service: 's3', region: 'us-east-1', credentials: { ...creds, secretAccessKey: opts.secret ?? creds.secretAccessKey }, sha256: Sha256, uriEscapePath: false })
  const req = await signer.sign(
    { method: 'PUT', protocol: 'http:', hostname: '127.0.0.1', port: 4569, path: opts.path ?? '/mapwright-logs/logs/report-1/a.csv', query: opts.query ?? {}, headers: { host: '127.0.0.1:4569', 'x-amz-content-sha256': 'UNSIGNED-PAYLOAD' } },
    { signingDate: opts.at ?? new Date() },
  )
  const qs = new URLSearchParams(req.query as Record<string, string>).toString()
  const headers = Object.fromEntries(Object.entries(req.headers).map(([k, v]) => [k.toLowerCase(), v]))
  return { method: req.method, url: qs ? `${req.path}?${qs}` : req.path, headers }
}

describe('the S3 stand-in gate', () => {
  it('accepts a request the SDK signed with the configured key, with or without a query', async () => {
    expect(signatureProblem(await signed(), creds)).toBeNull()
    expect(signatureProblem(await signed({ query: { partNumber: '2', uploadId: '0123456789abcdef0123456789abcdef' } }), creds)).toBeNull()
  })

  it('refuses an unsigned request, another secret, a changed path, and an old request', async () => {
    expect(signatureProblem({ method: 'GET', url: '/mapwright-logs/x', headers: {} }, creds)).toMatch(/not signed/)
    expect(signatureProblem(await signed({ secret: 'guessed' }), creds)).toMatch(/does not match/)
    const moved = await signed()
    expect(signatureProblem({ ...moved, url: '/mapwright-logs/logs/report-2/a.csv' }, creds)).toMatch(/does not match/)
    // 15 minutes, as S3 itself allows (AWS documentation, "Authenticating requests: request time").
    expect(signatureProblem(await signed({ at: new Date(Date.now() - 16 * 60_000) }), creds)).toMatch(/too far/)
    expect(signatureProblem(await signed(), { ...creds, accessKeyId: 'OTHER' })).toMatch(/Unknown access key/)
  })
})

// Types for s3-gate.mjs, so TypeScript tests can check the gate's signature rule directly.
import type { IncomingMessage, RequestListener } from 'node:http'
type Creds = { accessKeyId: string; secretAccessKey: string }
type SignedRequest = Pick<IncomingMessage, 'method' | 'url' | 'headers'>
export declare function signatureProblem(req: SignedRequest, creds: Creds, now?: number): string | null
export declare function sweepStaleUploads(root: string, bucket: string, now?: number): void
export declare function s3Gate(opts: { root: string; creds: Creds; next: RequestListener }): RequestListener

// Types for server.mjs, so tests can wrap a handler the way the production server does.
import type { IncomingMessage, ServerResponse } from 'node:http'
export declare const PEER_HEADER: string
export declare function stampingListener(handle: (req: IncomingMessage, res: ServerResponse) => unknown): (req: IncomingMessage, res: ServerResponse) => unknown

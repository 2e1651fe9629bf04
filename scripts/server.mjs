// Mapwright's production server: Next.js behind a plain Node HTTP server that stamps each request
// with the socket's peer address (app/_lib/http/client-address.ts), so the app never has to take a
// client's word for where it is. Usage: node scripts/server.mjs [-H host] [-p port]
import http from 'node:http'
import { pathToFileURL } from 'node:url'

export const PEER_HEADER = 'x-mapwright-peer'
const PEER_STAMP = Symbol.for('mapwright.peer-header-stamped')

/** Wrap a request handler: the peer header is always the socket's address, whatever the client sent. */
export function stampingListener(handle) {
  globalThis[PEER_STAMP] = true
  return (req, res) => {
    req.headers[PEER_HEADER] = req.socket.remoteAddress ?? ''
    return handle(req, res)
  }
}

function arg(flag, fallback) {
  const i = process.argv.indexOf(flag)
  return i > 0 ? process.argv[i + 1] : fallback
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) {
  process.env.NODE_ENV ??= 'production'
  const hostname = arg('-H', process.env.HOST ?? '127.0.0.1')
  const port = Number(arg('-p', process.env.PORT ?? '3000'))
  const { default: next } = await import('next')
  const app = next({ dev: false, hostname, port, dir: process.cwd() })
  await app.prepare()
  const server = http.createServer(stampingListener(app.getRequestHandler()))
  server.listen(port, hostname, () => console.log(`▲ Ready on http://${hostname}:${port}`))
  // After the last request, the drive-log worker (instrumentation.ts) finishes or releases its analyses.
  const stop = () =>
    server.close(async () => {
      await globalThis[Symbol.for('mapwright.log-worker')]?.stop()
      process.exit(0)
    })
  process.on('SIGTERM', stop)
  process.on('SIGINT', stop)
}

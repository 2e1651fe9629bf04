import http from 'node:http'
import type { AddressInfo } from 'node:net'
import { afterEach, describe, expect, it } from 'vitest'
import * as programsRoute from '@/app/api/programs/route'
import { PEER_HEADER, PEER_STAMP } from '@/app/_lib/http/client-address'
import { listAudit } from '@/db/queries/audit'
import { demoTipper } from '@/db/demo/programs'
import { stampingListener } from '@/scripts/server.mjs'
import { call, makeUser, sessionCookie } from '@/tests/support/api'

const stamp = globalThis as unknown as Record<symbol, unknown>
afterEach(() => {
  delete stamp[PEER_STAMP]
})

describe('client address in the audit trail', () => {
  it('records the connection peer, not a forged X-Forwarded-For (no trusted proxy is configured)', async () => {
    stamp[PEER_STAMP] = true
    const admin = await makeUser('admin')
    const cookie = await sessionCookie(admin)
    const forged = "=cmd|' /C calc'!A0"
    const res = await call(programsRoute.POST, { method: 'POST', cookie, body: { name: 'Addressed', description: '', params: demoTipper }, headers: { [PEER_HEADER]: '192.0.2.44', 'x-forwarded-for': forged, 'x-real-ip': '=HYPERLINK("http://x.test")' } })
    expect(res.status).toBe(201)
    const [row] = await listAudit({ actorId: admin.id, action: 'program.create' })
    expect(row.ip).toBe('192.0.2.44')
  })

  it('without the production server in front (no stamp), trusts no header at all', async () => {
    const admin = await makeUser('admin')
    await call(programsRoute.POST, { method: 'POST', cookie: await sessionCookie(admin), body: { name: 'Unstamped', description: '', params: demoTipper }, headers: { [PEER_HEADER]: '192.0.2.45', 'x-forwarded-for': '192.0.2.46' } })
    const [row] = await listAudit({ actorId: admin.id, action: 'program.create' })
    expect(row.ip).toBeNull()
  })

  it("the production server overwrites a client's own peer header with the socket address", async () => {
    const server = http.createServer(stampingListener((req, res) => res.end(String(req.headers[PEER_HEADER]))))
    await new Promise<void>((r) => server.listen(0, '127.0.0.1', r))
    try {
      const { port } = server.address() as AddressInfo
      const seen = await (await fetch(`http://127.0.0.1:${port}/`, { headers: { [PEER_HEADER]: '1.2.3.4', 'x-forwarded-for': '1.2.3.4' } })).text()
      expect(seen).toBe('127.0.0.1')
    } finally {
      server.close()
    }
  })
})

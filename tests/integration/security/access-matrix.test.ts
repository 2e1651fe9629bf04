import fs from 'node:fs'
import path from 'node:path'
import { describe, expect, it } from 'vitest'
import { ROLES } from '@/domain/roles'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { describeAccess, discoverRoutes } from '@/tests/support/routes'

// Every route handler is found from the code, so a new one cannot be missed: each must declare its
// access, and each is called anonymously and as every role. The docs table is checked against it.
describe('access matrix', async () => {
  const routes = await discoverRoutes()

  it('finds the route handlers, and every one declares who may call it', () => {
    expect(routes.length).toBeGreaterThan(30)
    const undeclared = routes.filter((r) => r.access === undefined).map((r) => `${r.method} ${r.pattern}`)
    expect(undeclared).toEqual([])
  })

  it('has no server actions outside the declared wrapper', () => {
    const files: string[] = []
    const walk = (d: string) => fs.readdirSync(d, { withFileTypes: true }).forEach((e) => (e.isDirectory() ? walk(path.join(d, e.name)) : /\.tsx?$/.test(e.name) && files.push(path.join(d, e.name))))
    walk(path.join(process.cwd(), 'app'))
    const actions = files.filter((f) => /^\s*['"]use server['"]/m.test(fs.readFileSync(f, 'utf8')))
    expect(actions).toEqual([])
  })

  it('answers 401 to anonymous callers, 403 to roles outside the rule, and lets the allowed roles past the check', async () => {
    const cookies = Object.fromEntries(await Promise.all(ROLES.map(async (r) => [r, await sessionCookie(await makeUser(r))] as const)))
    const rows: string[] = []
    let checks = 0
    for (const r of routes) {
      if (r.access === 'next-auth' || r.access === 'public') continue
      const params = Object.fromEntries(r.params.map((p) => [p, '999999']))
      const send = (cookie?: string) => call(r.handler, { method: r.method, path: r.pattern, cookie, params, body: r.method === 'GET' ? undefined : {} })
      const anon = await send()
      expect(`${r.method} ${r.pattern} anonymous → ${anon.status}`).toBe(`${r.method} ${r.pattern} anonymous → 401`)
      checks++
      for (const role of ROLES) {
        const res = await send(cookies[role])
        const allowed = r.access === 'signed-in' || r.access.includes(role)
        const got = res.status === 403 ? 'forbidden' : res.status === 401 ? 'unauthenticated' : 'past the check'
        expect(`${r.method} ${r.pattern} as ${role}: ${got}`).toBe(`${r.method} ${r.pattern} as ${role}: ${allowed ? 'past the check' : 'forbidden'}`)
        expect(res.status).toBeLessThan(500)
        checks++
      }
      rows.push(`${r.method} ${r.pattern}`)
    }
    console.log(`access matrix: ${rows.length} route methods × (anonymous + ${ROLES.length} roles) = ${checks} checks`)
  })

  it('matches the table of who may do what in docs/security.md', () => {
    // PRINT_ACCESS_TABLE=1 prints the table to paste into the doc after adding a route.
    if (process.env.PRINT_ACCESS_TABLE) console.log(['| method | route | who may call it |', '| --- | --- | --- |', ...routes.map((r) => `| ${r.method} | \`${r.pattern}\` | ${describeAccess(r.access)} |`)].join('\n'))
    const doc = fs.readFileSync(path.join(process.cwd(), 'docs', 'security.md'), 'utf8')
    for (const r of routes) expect(doc).toContain(`| ${r.method} | \`${r.pattern}\` | ${describeAccess(r.access)} |`)
  })
})

// Every route handler under app/api, found from the files themselves, with its declared access.
import fs from 'node:fs'
import path from 'node:path'
import type { Access } from '@/app/_lib/http/access'

export const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const
export type Method = (typeof METHODS)[number]

export interface RouteEntry {
  file: string
  /** URL pattern, e.g. /api/maps/[id]/revisions */
  pattern: string
  method: Method
  access: Access | 'next-auth'
  params: string[]
}

function walk(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? walk(path.join(dir, e.name)) : e.name === 'route.ts' ? [path.join(dir, e.name)] : []))
}

type Handler = ((req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>) & { access?: Access }

/** Import each route file and read the access rule off each exported method. */
export async function discoverRoutes(root = path.join(process.cwd(), 'app', 'api')): Promise<(RouteEntry & { handler: Handler })[]> {
  const out: (RouteEntry & { handler: Handler })[] = []
  for (const file of walk(root).sort()) {
    const rel = path.relative(path.join(process.cwd(), 'app'), path.dirname(file))
    const pattern = '/' + rel.split(path.sep).join('/')
    const mod = (await import(file)) as Partial<Record<Method, Handler>>
    const params = [...pattern.matchAll(/\[(?:\.\.\.)?(\w+)\]/g)].map((m) => m[1])
    for (const method of METHODS) {
      const handler = mod[method]
      if (!handler) continue
      // next-auth's own endpoints are the sign-in machinery itself: public by nature.
      const access = pattern.startsWith('/api/auth/') ? 'next-auth' : (handler.access ?? (undefined as unknown as Access))
      out.push({ file: path.relative(process.cwd(), file), pattern, method, access, params, handler })
    }
  }
  return out
}

export function describeAccess(a: Access | 'next-auth'): string {
  if (a === 'public' || a === 'next-auth') return 'anyone'
  if (a === 'signed-in') return 'any signed-in user'
  return a.map((r) => r.replace(/_/g, ' ')).join(', ')
}

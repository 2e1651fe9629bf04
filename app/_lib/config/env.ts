import 'server-only'
import { z } from 'zod'

const schema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  NEXTAUTH_SECRET: z.string().min(16, 'NEXTAUTH_SECRET must be at least 16 characters').optional(),
  NEXTAUTH_URL: z.url('NEXTAUTH_URL must be a full URL such as http://127.0.0.1:3000').optional(),
  DATABASE_URL: z.string().startsWith('postgres', 'DATABASE_URL must be a postgres:// or postgresql:// URL').optional(),
  PGLITE_DATA_DIR: z.string().optional(),
  MAPWRIGHT_DEMO: z.enum(['0', '1']).optional(),
  S3_ENDPOINT: z.url('S3_ENDPOINT must be a URL such as http://127.0.0.1:4569').optional(),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().min(3, 'S3_BUCKET must name a bucket').default('mapwright-logs'),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  S3_FORCE_PATH_STYLE: z.enum(['0', '1']).optional(),
  SMTP_URL: z.string().regex(/^smtps?:\/\//, 'SMTP_URL must start with smtp:// or smtps://').optional(),
  MAIL_FROM: z.string().default('Mapwright <mapwright@localhost>'),
  MAIL_OUTBOX_FILE: z.string().optional(),
  LOG_MAX_BYTES: z.coerce.number().int().positive().default(200 * 1024 * 1024),
  // Drive-log analyses this server runs at once; 0: it runs none (another server's worker must).
  LOG_ANALYSIS_CONCURRENCY: z.coerce.number().int().min(0).max(16).default(2),
  // Addresses of reverse proxies whose X-Forwarded-For is believed, comma-separated; unset: none.
  TRUSTED_PROXIES: z
    .string()
    .default('')
    .refine((v) => v.split(',').every((a) => !a.trim() || /^[0-9a-fA-F:.]+$/.test(a.trim())), 'TRUSTED_PROXIES must list IP addresses separated by commas, such as 127.0.0.1,::1'),
})

export type Env = z.infer<typeof schema> & { authSecret: string; trustedProxies: string[] }

let cached: Env | undefined

/** Environment, parsed once; a malformed variable stops the server with a message naming it. */
export function env(): Env {
  if (cached) return cached
  const parsed = schema.safeParse(process.env)
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n')
    throw new Error(`Mapwright configuration is invalid:\n${lines}`)
  }
  const e = parsed.data
  let authSecret = e.NEXTAUTH_SECRET
  if (!authSecret) {
    // Development and tests get a fixed secret; a production server must be given its own.
    if (e.NODE_ENV === 'production') throw new Error('NEXTAUTH_SECRET is required in production (npm run start sets one up in .data/)')
    authSecret = 'mapwright-development-secret-not-for-production'
  }
  const trustedProxies = e.TRUSTED_PROXIES.split(',').map((a) => a.trim()).filter(Boolean)
  cached = { ...e, authSecret, trustedProxies }
  return cached
}

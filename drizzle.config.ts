import { defineConfig } from 'drizzle-kit'

// `drizzle-kit generate` needs no database: it diffs the schema against the committed snapshots.
export default defineConfig({
  dialect: 'postgresql',
  schema: './db/schema.ts',
  out: './db/migrations',
})

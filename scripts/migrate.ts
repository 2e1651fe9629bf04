// Apply pending migrations and stop: run once before starting several app servers on one PostgreSQL.
import { closeDb, getHandle } from '../db/client'

async function main() {
  const { kind } = await getHandle()
  console.log(`Migrations applied on ${kind}.`)
  await closeDb()
}

main().catch(async (e) => {
  console.error(e instanceof Error ? e.message : e)
  await closeDb().catch(() => {})
  process.exit(1)
})

// Apply migrations and load the invented demo scenario; safe to run again (adds nothing twice).
import { closeDb, getHandle } from '../db/client'
import { DEMO_PASSWORD, DEMO_USERS, seedDemo } from '../db/seed'
import { hashPassword } from '../app/_lib/auth/password'
import { seedWorkflow } from './seed-workflow'

async function main() {
  const { db, kind } = await getHandle()
  const result = await seedDemo(db, hashPassword)
  console.log(`Demo data on ${kind}: ${result.usersAdded} users, ${result.programsAdded} vehicle programs and ${result.mapsAdded} maps added (existing rows kept).`)
  if (process.env.S3_ENDPOINT && (await seedWorkflow(db))) console.log('Demo workflow: map sets (one released, one withdrawn, one under test), drive reports with logs, a parameter version 2, a revision sent back.')
  console.log(`\nDemo accounts (password for all: ${DEMO_PASSWORD}):`)
  for (const u of DEMO_USERS) console.log(`  ${u.role.padEnd(21)} ${u.email}`)
  await closeDb()
}

main().catch(async (e) => {
  console.error(e instanceof Error ? e.message : e)
  await closeDb().catch(() => {})
  process.exit(1)
})

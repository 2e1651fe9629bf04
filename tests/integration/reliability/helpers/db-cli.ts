// A tiny command line over the app's own db layer, run in a child process (tsx) so a test can put data
// in a PGlite folder or a PostgreSQL database of its choosing (PGLITE_DATA_DIR / DATABASE_URL), the way
// the server would, and read it back.
//   add-user EMAIL   create a user      emails   print the users' emails as JSON      hold   keep the database open
import { closeDb, getHandle } from '../../../../db/client'
import { createUser, listUsers } from '../../../../db/queries/users'

async function main() {
  const [cmd, arg] = process.argv.slice(2)
  await getHandle()
  if (cmd === 'add-user') await createUser({ email: arg, name: arg.split('@')[0], role: 'calibration_engineer', passwordHash: 'not-a-real-hash' })
  else if (cmd === 'emails') console.log(JSON.stringify((await listUsers()).map((u) => u.email).sort()))
  else if (cmd === 'hold') {
    console.log('holding')
    await new Promise(() => {}) // until killed: the folder's lock names this live process
  } else throw new Error(`unknown command ${cmd}`)
  await closeDb()
}

main().catch(async (e) => {
  console.error(e instanceof Error ? e.message : e)
  await closeDb().catch(() => {})
  process.exit(1)
})

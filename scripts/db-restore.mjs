// npm run db:restore -- FILE [--force]: put a backup from db:backup back. Nothing is lost on the way:
//  • PGlite: refused while a live Mapwright process holds the folder's lock. The tarball is unpacked and
//    opened in a new sibling folder first; only when that works is the current folder renamed aside
//    (<folder>.before-restore-<timestamp>) and the new one moved into its place.
//  • PostgreSQL (DATABASE_URL set): refused while other sessions are connected (unless --force); the
//    current database is first dumped to .data/backups/before-restore-<timestamp>.dump, then pg_restore
//    replaces it in one transaction.
import fs from 'node:fs'
import path from 'node:path'
import {
  backupsDir, describeDb, fail, lockOrFail, pgliteDir, requirePgTool, runTool, stamp,
} from './db-backup.mjs'

const args = process.argv.slice(2)
const force = args.includes('--force')
const fileArg = args.find((a) => !a.startsWith('--'))

if (args.includes('--help') || args.includes('-h') || !fileArg) {
  const known = fs.existsSync(backupsDir()) ? fs.readdirSync(backupsDir()).filter((f) => /\.(tar\.gz|dump)$/.test(f)).sort() : []
  console.log('Usage: npm run db:restore -- FILE [--force]\n  FILE: a .tar.gz (PGlite) or .dump (PostgreSQL, DATABASE_URL set) from npm run db:backup.')
  if (known.length) console.log(`Backups in ${backupsDir()}:\n${known.map((f) => `  ${f}`).join('\n')}`)
  process.exit(fileArg || args.includes('--help') || args.includes('-h') ? 0 : 1)
}
const file = path.resolve(fileArg)
if (!fs.existsSync(file)) fail(`No backup file at ${file}`)

async function restorePglite() {
  const dir = pgliteDir()
  const at = stamp()
  const staging = `${dir}.restoring-${at}`
  const aside = `${dir}.before-restore-${at}`
  // Hold the folder's lock for the whole swap: a server must not open either folder half way.
  const releaseOld = fs.existsSync(dir) ? lockOrFail(dir, 'Stop the server first: the folder is in use, and restoring under it would corrupt both.') : () => {}
  try {
    const { PGlite } = await import('@electric-sql/pglite')
    const pg = new PGlite(staging, { loadDataDir: new Blob([fs.readFileSync(file)]) })
    await pg.waitReady
    const counts = await describeDb(pg)
    await pg.close()
    // The tarball carries the lock file of the process that made it; ours replaces it, so the new
    // folder is locked from the moment it appears under the real name.
    fs.writeFileSync(path.join(staging, 'mapwright.lock'), String(process.pid))
    if (fs.existsSync(dir)) fs.renameSync(dir, aside)
    fs.renameSync(staging, dir)
    fs.rmSync(path.join(dir, 'mapwright.lock'), { force: true })
    if (fs.existsSync(aside)) fs.rmSync(path.join(aside, 'mapwright.lock'), { force: true })
    console.log(`Restored ${file}\n  into ${dir} (${counts})`)
    if (fs.existsSync(aside)) console.log(`  the previous folder is kept at ${aside}; delete it when you no longer need it`)
  } catch (e) {
    // Put the current folder back if it was already moved aside, then drop the half-made one.
    if (!fs.existsSync(dir) && fs.existsSync(aside)) fs.renameSync(aside, dir)
    fs.rmSync(staging, { recursive: true, force: true })
    fail(`Restore failed; ${dir} is unchanged: ${e instanceof Error ? e.message : e}`)
  } finally {
    releaseOld()
  }
}

async function restorePostgres(url) {
  requirePgTool('pg_restore')
  requirePgTool('pg_dump')
  const { default: pg } = await import('pg')
  const client = new pg.Client({ connectionString: url })
  await client.connect()
  const { rows } = await client.query('select count(*)::int as n from pg_stat_activity where datname = current_database() and pid <> pg_backend_pid()')
  await client.end()
  if (rows[0].n > 0 && !force) fail(`${rows[0].n} other session(s) are connected to this database: stop the server first (or pass --force).`)
  fs.mkdirSync(backupsDir(), { recursive: true })
  const aside = path.join(backupsDir(), `before-restore-${stamp()}.dump`)
  if ((await runTool('pg_dump', ['--format=custom', '--no-owner', `--file=${aside}`, `--dbname=${url}`])) !== 0) fail('Could not save the current database first (pg_dump failed); nothing was restored.')
  const code = await runTool('pg_restore', ['--clean', '--if-exists', '--no-owner', '--single-transaction', '--exit-on-error', `--dbname=${url}`, file])
  if (code !== 0) fail(`pg_restore failed (exit ${code}); the transaction was rolled back, the database is unchanged. The previous state is also in ${aside}.`)
  console.log(`Restored ${file} into the PostgreSQL database; the previous state is kept in ${aside}`)
}

const url = process.env.DATABASE_URL
await (url ? restorePostgres(url) : restorePglite())

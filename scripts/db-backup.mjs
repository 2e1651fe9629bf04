// npm run db:backup [-- FILE]: a consistent copy of the database.
//  • PGlite (default): takes the data folder's lock (refused while a live Mapwright process holds it),
//    opens the folder, checkpoints, and writes PGlite's own gzipped tarball of it (dumpDataDir), then
//    checks that the tarball opens. Default FILE: .data/backups/<timestamp>.tar.gz
//  • PostgreSQL (DATABASE_URL set): pg_dump in its custom format. Default FILE: .data/backups/<timestamp>.dump
// Run through tsx (package.json does) so the folder lock is db/lock.ts itself, not a copy of it.
// db-restore.mjs imports the helpers below; the backup itself runs only when this file is the script.
import { spawn, spawnSync } from 'node:child_process'
import fs from 'node:fs'
import path from 'node:path'
import { pathToFileURL } from 'node:url'
import { lockDataDir } from '../db/lock.ts'

export const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), '..')

/** The PGlite folder the app would open: PGLITE_DATA_DIR or .data/pglite (as db/client.ts). */
export function pgliteDir() {
  const dir = process.env.PGLITE_DATA_DIR || path.join(root, '.data', 'pglite')
  if (dir.startsWith('memory://')) fail('PGLITE_DATA_DIR is memory://: an in-memory database has nothing on disk to back up or restore.')
  return path.resolve(dir)
}

export const backupsDir = () => path.join(root, '.data', 'backups')

/** 2026-05-01T10-20-30-123Z: sortable, and safe in a file name on every system. */
export const stamp = () => new Date().toISOString().replace(/[:.]/g, '-')

export function fail(message) {
  console.error(message)
  process.exit(1)
}

/** Take the folder lock of db/lock.ts, or stop with its message (which names the live holder's pid). */
export function lockOrFail(dir, why) {
  try {
    return lockDataDir(dir)
  } catch (e) {
    fail(`${e instanceof Error ? e.message : e}\n${why}`)
  }
}

/** Write through a temporary name and rename, so a crash never leaves a half-written backup under the real name. */
export function writeAtomically(file, bytes) {
  fs.mkdirSync(path.dirname(file), { recursive: true })
  const tmp = `${file}.partial`
  fs.writeFileSync(tmp, bytes)
  fs.renameSync(tmp, file)
}

/** Open a PGlite tarball in memory and count what it holds: proof the copy is usable. */
export async function checkTarball(bytes) {
  const { PGlite } = await import('@electric-sql/pglite')
  const pg = new PGlite({ loadDataDir: new Blob([bytes]) })
  await pg.waitReady
  try {
    return await describeDb(pg)
  } finally {
    await pg.close()
  }
}

/** "12 users, 3 maps, 40 revisions" (or that the schema is not there yet). */
export async function describeDb(pg) {
  const exists = await pg.query("select to_regclass('public.map_revisions') is not null as ok")
  if (!exists.rows[0].ok) return 'no Mapwright tables yet'
  const r = await pg.query('select (select count(*) from users)::int as u, (select count(*) from maps)::int as m, (select count(*) from map_revisions)::int as r')
  const { u, m, r: revs } = r.rows[0]
  return `${u} users, ${m} maps, ${revs} revisions`
}

/** The full path of a command on PATH, or null. */
export function commandOnPath(name) {
  const r = spawnSync('sh', ['-c', `command -v ${name}`], { encoding: 'utf8' })
  return r.status === 0 ? r.stdout.trim() : null
}

export function requirePgTool(name) {
  if (!commandOnPath(name))
    fail(`${name} is not on PATH, so a PostgreSQL database (DATABASE_URL) cannot be ${name === 'pg_dump' ? 'backed up' : 'restored'} by this script.\nInstall the PostgreSQL client tools of the server's major version (Debian: apt-get install postgresql-client) or use your provider's backups.`)
}

/** Run a PostgreSQL client tool with inherited output; resolves with its exit code. */
export function runTool(cmd, args) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: ['ignore', 'inherit', 'inherit'] })
    child.on('error', reject)
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)))
  })
}

async function backupPglite(arg) {
  const dir = pgliteDir()
  if (!fs.existsSync(path.join(dir, 'PG_VERSION'))) fail(`There is no PGlite database in ${dir} (no PG_VERSION file). Set PGLITE_DATA_DIR to the folder to back up.`)
  const file = path.resolve(arg ?? path.join(backupsDir(), `${stamp()}.tar.gz`))
  // The lock keeps a server from opening the folder while we copy it; a live holder means a running server.
  const release = lockOrFail(dir, 'Stop the server first: a copy taken while it writes could be torn.')
  try {
    const { PGlite } = await import('@electric-sql/pglite')
    const pg = new PGlite(dir)
    await pg.waitReady
    await pg.exec('CHECKPOINT') // everything committed is in the data files, not only in the WAL
    const blob = await pg.dumpDataDir('gzip')
    await pg.close()
    const bytes = Buffer.from(await blob.arrayBuffer())
    writeAtomically(file, bytes)
    const counts = await checkTarball(bytes)
    console.log(`Backed up PGlite folder ${dir}\n  to ${file} (${(bytes.length / 1024).toFixed(0)} KiB)\n  checked: the copy opens and holds ${counts}`)
  } finally {
    release()
  }
}

async function backupPostgres(url, arg) {
  requirePgTool('pg_dump')
  const file = path.resolve(arg ?? path.join(backupsDir(), `${stamp()}.dump`))
  fs.mkdirSync(path.dirname(file), { recursive: true })
  const tmp = `${file}.partial`
  // Custom format: compressed, and pg_restore can clean and restore it in one transaction.
  const code = await runTool('pg_dump', ['--format=custom', '--no-owner', `--file=${tmp}`, `--dbname=${url}`])
  if (code !== 0) {
    fs.rmSync(tmp, { force: true })
    fail(`pg_dump failed (exit ${code}); nothing was written. "server version mismatch" means pg_dump must be at least the server's major version.`)
  }
  fs.renameSync(tmp, file)
  console.log(`Backed up the PostgreSQL database to ${file} (${(fs.statSync(file).size / 1024).toFixed(0)} KiB) with ${commandOnPath('pg_dump')}`)
}

if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  const arg = process.argv[2]
  if (arg === '--help' || arg === '-h') {
    console.log('Usage: npm run db:backup [-- FILE]\n  PGlite: a .tar.gz of the data folder (stop the server first).\n  PostgreSQL (DATABASE_URL set): a pg_dump custom-format file.\n  Default FILE: .data/backups/<timestamp>.tar.gz or .dump')
    process.exit(0)
  }
  const url = process.env.DATABASE_URL
  await (url ? backupPostgres(url, arg) : backupPglite(arg))
}

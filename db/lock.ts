import fs from 'node:fs'
import path from 'node:path'

/** Raised when another live process already holds the PGlite data directory. */
export class DatabaseLockedError extends Error {
  constructor(
    readonly dir: string,
    readonly holderPid: number,
  ) {
    super(
      `The database folder ${dir} is in use by another Mapwright process (pid ${holderPid}). ` +
        'PGlite allows one process per folder: stop that process, or set PGLITE_DATA_DIR to another folder.',
    )
    this.name = 'DatabaseLockedError'
  }
}

/** The `code` of a Node system error (EPERM, EEXIST, …), if it has one. */
function errorCode(e: unknown): unknown {
  return e instanceof Error && 'code' in e ? e.code : undefined
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0)
    return true
  } catch (e) {
    // EPERM means the process exists but belongs to someone else: still a live holder.
    return errorCode(e) === 'EPERM'
  }
}

/**
 * Take an exclusive lock on a PGlite data directory: PGlite has no lock between processes and two
 * writers lose rows silently. The lock file holds the owner's pid; a stale file (dead pid) is taken over.
 * Returns a release function. Re-entrant within one process.
 */
export function lockDataDir(dir: string): () => void {
  fs.mkdirSync(dir, { recursive: true })
  const file = path.join(dir, 'mapwright.lock')
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      fs.writeFileSync(file, String(process.pid), { flag: 'wx' })
      const release = () => {
        try {
          if (fs.readFileSync(file, 'utf8').trim() === String(process.pid)) fs.unlinkSync(file)
        } catch {
          /* already gone */
        }
      }
      process.once('exit', release)
      return release
    } catch (e) {
      if (errorCode(e) !== 'EEXIST') throw e
      const holder = Number.parseInt(fs.readFileSync(file, 'utf8').trim(), 10)
      if (holder === process.pid) return () => {}
      if (Number.isInteger(holder) && holder > 0 && isAlive(holder)) throw new DatabaseLockedError(dir, holder)
      fs.rmSync(file, { force: true }) // stale: the holder died without releasing
    }
  }
  throw new Error(`Could not take the lock on ${dir}`)
}

// Small helpers shared by the start, demo and test scripts.
import { spawn } from 'node:child_process'
import crypto from 'node:crypto'
import fs from 'node:fs'
import path from 'node:path'

export const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), '..')
export const bin = (name) => path.join(root, 'node_modules', '.bin', name)

/** Run a command, inheriting stdio; resolves with its exit code. */
export function run(cmd, args, opts = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: 'inherit', cwd: root, ...opts })
    child.on('error', reject)
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)))
  })
}

/** A per-install auth secret in .data/, created once, so sessions survive restarts. */
export function authSecret() {
  if (process.env.NEXTAUTH_SECRET) return process.env.NEXTAUTH_SECRET
  const file = path.join(root, '.data', 'auth-secret')
  fs.mkdirSync(path.dirname(file), { recursive: true })
  if (!fs.existsSync(file)) fs.writeFileSync(file, crypto.randomBytes(32).toString('base64url'), { mode: 0o600 })
  return fs.readFileSync(file, 'utf8').trim()
}

function newestMtime(p) {
  const st = fs.statSync(p, { throwIfNoEntry: false })
  if (!st) return 0
  if (!st.isDirectory()) return st.mtimeMs
  let m = 0
  for (const e of fs.readdirSync(p)) if (e !== 'node_modules' && !e.startsWith('.')) m = Math.max(m, newestMtime(path.join(p, e)))
  return m
}

/** True when there is no production build or a source file is newer than it. */
export function buildIsStale() {
  const id = fs.statSync(path.join(root, process.env.NEXT_DIST_DIR || '.next', 'BUILD_ID'), { throwIfNoEntry: false })
  if (!id) return true
  const sources = ['app', 'maps', 'physics', 'db', 'package.json', 'next.config.ts', 'postcss.config.mjs'].map((p) => path.join(root, p))
  return Math.max(...sources.map(newestMtime)) > id.mtimeMs
}

export async function buildIfStale() {
  if (process.env.MAPWRIGHT_SKIP_BUILD === '1' || !buildIsStale()) return
  console.log('Building the production app (first run or sources changed)…')
  const code = await run(bin('next'), ['build'])
  if (code !== 0) process.exit(code)
}

// Which Chromium the e2e suite drives. No browser is ever downloaded: the choices are a path the user
// names, Debian's package, or the build that ships inside the @sparticuz/chromium npm package.
// Order: CHROMIUM_PATH (if that file exists) → /usr/bin/chromium (if present) → @sparticuz/chromium.
import os from 'node:os'
import path from 'node:path'

export const DEBIAN_CHROMIUM = '/usr/bin/chromium'

/** Flags for every choice: root needs --no-sandbox; the rest keep the browser off the network. */
export const COMMON_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
]

// The package's own flag list is made for a serverless sandbox. Left out here:
// --single-process (the browser dies when Playwright closes a test's context), and flags that turn
// browser security off (the tests must see the same-origin rules a user's browser applies).
export const NPM_ARGS_LEFT_OUT = new Set([
  '--single-process',
  '--disable-web-security',
  '--allow-running-insecure-content',
  '--disable-site-isolation-trials',
])

export type ChromiumChoice = {
  source: 'CHROMIUM_PATH' | 'debian' | 'npm'
  executablePath: string
  args: string[]
  /** Lines to print at the start of the run (what was chosen, and why an earlier choice was passed over). */
  notes: string[]
}

/** Where @sparticuz/chromium's executablePath() unpacks its binary (it always uses os.tmpdir()/chromium). */
export const npmChromiumPath = () => path.join(os.tmpdir(), 'chromium')

export function chooseChromium(
  env: Record<string, string | undefined>,
  exists: (p: string) => boolean,
  npmArgs: () => string[],
): ChromiumChoice {
  const notes: string[] = []
  const named = env.CHROMIUM_PATH
  if (named) {
    if (exists(named)) return { source: 'CHROMIUM_PATH', executablePath: named, args: COMMON_ARGS, notes: [`e2e browser: ${named} (from CHROMIUM_PATH)`] }
    notes.push(`CHROMIUM_PATH=${named} does not exist; falling back.`)
  }
  if (exists(DEBIAN_CHROMIUM)) {
    notes.push(`e2e browser: ${DEBIAN_CHROMIUM} (Debian's chromium package)`)
    return { source: 'debian', executablePath: DEBIAN_CHROMIUM, args: COMMON_ARGS, notes }
  }
  notes.push(`${DEBIAN_CHROMIUM} is not installed; e2e browser: @sparticuz/chromium from node_modules, unpacked to ${npmChromiumPath()}`)
  const args = [...COMMON_ARGS, ...npmArgs().filter((a) => !NPM_ARGS_LEFT_OUT.has(a) && !a.startsWith('--headless'))]
  return { source: 'npm', executablePath: npmChromiumPath(), args: [...new Set(args)], notes }
}

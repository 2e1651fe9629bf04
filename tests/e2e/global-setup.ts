// Runs once before the e2e tests: says which Chromium was chosen and, for the npm build, unpacks it
// (the config only knows its path; unpacking is async and must happen before any worker launches it).
import { execFileSync } from 'node:child_process'
import fs from 'node:fs'
import sparticuz from '@sparticuz/chromium'
import { chooseChromium } from './browser'

export default async function globalSetup() {
  const choice = chooseChromium(process.env, fs.existsSync, () => sparticuz.args)
  for (const line of choice.notes) console.log(line)
  if (choice.source === 'npm') {
    const unpacked = await sparticuz.executablePath()
    if (unpacked !== choice.executablePath)
      throw new Error(`@sparticuz/chromium unpacked to ${unpacked}, expected ${choice.executablePath}: update tests/e2e/browser.ts`)
  }
  const version = execFileSync(choice.executablePath, ['--version'], { encoding: 'utf8' }).trim()
  console.log(`e2e browser version: ${version}; flags: ${choice.args.join(' ')}`)
}

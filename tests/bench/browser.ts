/**
 * The Chromium the browser benchmarks drive: the e2e suite's choice (CHROMIUM_PATH, Debian's
 * package, else the build inside the @sparticuz/chromium npm package, unpacked on first use), so a
 * benchmark runs wherever the e2e tests run. Never a browser download.
 */
import fs from 'node:fs'
import sparticuz from '@sparticuz/chromium'
import { chromium, type Browser } from 'playwright-core'
import { chooseChromium } from '../e2e/browser'

export async function launchChromium(): Promise<Browser> {
  const choice = chooseChromium(process.env, fs.existsSync, () => sparticuz.args)
  if (choice.source === 'npm') await sparticuz.executablePath()
  return chromium.launch({ executablePath: choice.executablePath, args: choice.args })
}

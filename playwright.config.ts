import fs from 'node:fs'
import { defineConfig } from '@playwright/test'
import sparticuz from '@sparticuz/chromium'
import { chooseChromium } from './tests/e2e/browser'

const port = Number(process.env.E2E_PORT ?? 3100)

// Never a browser download: CHROMIUM_PATH, else Debian's Chromium, else the build inside the
// @sparticuz/chromium npm package (see tests/e2e/browser.ts), against the production build on 127.0.0.1.
const browser = chooseChromium(process.env, fs.existsSync, () => sparticuz.args)

export default defineConfig({
  testDir: 'tests/e2e',
  globalSetup: './tests/e2e/global-setup.ts',
  fullyParallel: false,
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  timeout: 60_000,
  reporter: [['list']],
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    screenshot: 'only-on-failure',
    trace: 'off',
    launchOptions: { executablePath: browser.executablePath, args: browser.args },
  },
  webServer: {
    command: `node scripts/e2e-server.mjs ${port}`,
    url: `http://127.0.0.1:${port}/signin`,
    timeout: 180_000,
    reuseExistingServer: false,
    stdout: 'pipe',
    stderr: 'pipe',
  },
})

import { describe, expect, it } from 'vitest'
import { chooseChromium, COMMON_ARGS, DEBIAN_CHROMIUM, npmChromiumPath } from '@/tests/e2e/browser'

const npmArgs = () => ['--single-process', '--disable-web-security', "--headless='shell'", '--no-zygote', '--no-sandbox']
const only = (...present: string[]) => (p: string) => present.includes(p)

describe('chooseChromium: CHROMIUM_PATH → Debian → npm package', () => {
  it('uses CHROMIUM_PATH when that file exists, even with Debian present', () => {
    const c = chooseChromium({ CHROMIUM_PATH: '/opt/c' }, only('/opt/c', DEBIAN_CHROMIUM), npmArgs)
    expect(c).toMatchObject({ source: 'CHROMIUM_PATH', executablePath: '/opt/c', args: COMMON_ARGS })
  })

  it('says so when CHROMIUM_PATH is missing, then falls back to Debian', () => {
    const c = chooseChromium({ CHROMIUM_PATH: '/nowhere/chromium' }, only(DEBIAN_CHROMIUM), npmArgs)
    expect(c.source).toBe('debian')
    expect(c.notes[0]).toBe('CHROMIUM_PATH=/nowhere/chromium does not exist; falling back.')
  })

  it('falls back to the npm build with its flags, minus single-process and the security switches', () => {
    const c = chooseChromium({ CHROMIUM_PATH: '/nowhere/chromium' }, only(), npmArgs)
    expect(c.source).toBe('npm')
    expect(c.executablePath).toBe(npmChromiumPath())
    expect(c.args).toContain('--no-zygote')
    expect(c.args).not.toContain('--single-process')
    expect(c.args).not.toContain('--disable-web-security')
    expect(c.args.filter((a) => a.startsWith('--headless'))).toEqual(['--headless'])
    expect(c.args.filter((a) => a === '--no-sandbox')).toHaveLength(1)
    expect(c.notes).toHaveLength(2)
  })
})

import { describe, expect, it } from 'vitest'
import { formatBytes } from '@/app/_components/format'

// SI prefixes (k = 10³, M = 10⁶), as IEC 80000-13 and the SI brochure define them.
describe('file sizes', () => {
  it('shows sizes under 1 MB in kB, never as 0.0 MB', () => {
    expect(formatBytes(512)).toBe('512 B')
    expect(formatBytes(48_213)).toBe('48.2 kB')
    expect(formatBytes(999_949)).toBe('999.9 kB')
  })
  it('shows 1 MB and more in MB, with no "1000.0 kB" at the seam', () => {
    expect(formatBytes(999_950)).toBe('1.0 MB')
    expect(formatBytes(1_000_000)).toBe('1.0 MB')
    expect(formatBytes(209_715_200)).toBe('209.7 MB') // 200 MiB, the upload limit
  })
})

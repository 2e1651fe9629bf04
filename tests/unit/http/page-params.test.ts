// Page ids follow the API's intParam rule; what it refuses is a 404 page (notFound), never a number handed to the database.
import { describe, expect, it } from 'vitest'
import { idOrNull, pageId } from '@/app/_lib/http/page-params'

/** What Next's notFound() throws: an error whose digest marks the 404 fallback. */
function notFoundThrown(f: () => unknown): boolean {
  try {
    f()
  } catch (e) {
    return e instanceof Error && 'digest' in e && String(e.digest).endsWith(';404')
  }
  return false
}

// 2^31-1 is the largest value of a PostgreSQL integer column (PostgreSQL manual, numeric types).
const REFUSED = ['', '0', '-1', '1.5', '1e3', '0x10', ' 1', '1 ', '01', 'abc', 'NaN', '2147483648', '99999999999', '١']

describe('page ids', () => {
  it('reads plain positive digits up to 2^31-1', () => {
    expect(pageId('1', 'Map id')).toBe(1)
    expect(pageId('2147483647', 'Map id')).toBe(2_147_483_647)
    expect(idOrNull('42')).toBe(42)
  })

  it.each(REFUSED)('turns %j into the 404 page', (v) => {
    expect(notFoundThrown(() => pageId(v, 'Map id'))).toBe(true)
    expect(idOrNull(v)).toBeNull()
  })

  it('treats an absent or repeated search param as no id', () => {
    expect(idOrNull(undefined)).toBeNull()
    expect(idOrNull(['1', '2'])).toBeNull()
    expect(notFoundThrown(() => pageId(undefined, 'Map id'))).toBe(true)
  })
})

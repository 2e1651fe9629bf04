// A set may hold a draft whose map validation refuses (drafts can be driven on a closed course, not
// packaged): its test package is refused with the reason, and the set page still renders.
import { describe, expect, it } from 'vitest'
import { downloadPackage, makeSet, saveRevision, setSetup } from '@/tests/support/set-fixtures'
import { SMALL_DRIVE } from '@/tests/support/fixtures'

describe('a set holding a map that validation refuses', () => {
  it('answers the test package with a 4xx naming why, not a server error', async () => {
    const s = await setSetup()
    // Pedal 100 % asking for less than pedal 50 % at standstill: a pedal-order error the C header refuses.
    const rev = await saveRevision(s, s.mapId, 1, { ...SMALL_DRIVE, values: [[0, 0, 0], [1400, 700, 400], [100, 1500, 800]] })
    const id = await makeSet(s, { driveRevisionId: rev })
    const pkg = await downloadPackage(id, s.cookie, 'test')
    expect(pkg.status).toBeGreaterThanOrEqual(400)
    expect(pkg.status).toBeLessThan(500)
    expect(new TextDecoder().decode(pkg.bytes)).toMatch(/cannot be exported/)
  })
})

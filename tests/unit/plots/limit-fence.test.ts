import { describe, expect, it } from 'vitest'
import { limitFence } from '@/app/_components/plots/limit-fence'

describe('the traction-limit fence over a surface', () => {
  it('draws both pedal edges along speed and one rung per speed breakpoint, all at that speed’s limit', () => {
    const f = limitFence([0, 10, 20], [0, 50, 100], [3000, 2000, 1500]) as { type: string; x: (number | null)[]; y: (number | null)[]; z: (number | null)[] }
    expect(f.type).toBe('scatter3d')
    // edge at pedal 0, gap, edge at pedal 100, gap, then three rungs (0 → 100 % pedal), each followed by a gap
    expect(f.x).toEqual([0, 10, 20, null, 0, 10, 20, null, 0, 0, null, 10, 10, null, 20, 20, null])
    expect(f.y).toEqual([0, 0, 0, null, 100, 100, 100, null, 0, 100, null, 0, 100, null, 0, 100, null])
    expect(f.z).toEqual([3000, 2000, 1500, null, 3000, 2000, 1500, null, 3000, 3000, null, 2000, 2000, null, 1500, 1500, null])
  })
})

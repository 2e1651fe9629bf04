import { describe, expect, it } from 'vitest'
import { pasteOverflow } from '@/app/_components/map-grid/paste-overflow'

describe('pasteOverflow', () => {
  it('is null when the block fits exactly', () => {
    expect(pasteOverflow(5, 4, 1, 1, 4, 3)).toBeNull()
  })
  it('names the rows left out below the grid', () => {
    const m = pasteOverflow(5, 4, 3, 1, 4, 2)
    expect(m).toMatch(/4 × 2 but only 2 × 2 fits/)
    expect(m).toMatch(/2 rows \(pasted rows 3–4\) were left out/)
  })
  it('names rows and columns together, and a single one without a range', () => {
    expect(pasteOverflow(5, 4, 4, 3, 2, 3)).toMatch(/1 row \(pasted rows 2\) and 2 columns \(pasted columns 2–3\)/)
  })
})

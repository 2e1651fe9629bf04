// Stored parameter versions are immutable JSON: the new tyre and lateral fields must be optional, and blank form fields no change.
import { describe, expect, it } from 'vitest'
import { releaseConditionsSchema } from '@/app/_schemas/program'
import { withoutBlankTyre } from '@/app/(app)/programs/program-fields'
import { tractor } from '@/tests/support/fixtures'

describe('release conditions: design lateral acceleration', () => {
  it('conditions stored before the field existed still parse, without it', () => {
    const old = { surfaces: ['wet-asphalt', 'packed-snow'], loadCases: ['empty', 'laden'], marginPct: 10 }
    const r = releaseConditionsSchema.parse(old)
    expect(r.designLateralAccelMps2).toBeUndefined()
  })
  it('takes a value in m/s² and refuses one out of range, naming it', () => {
    const base = { surfaces: ['ice'], loadCases: ['empty'], marginPct: 10 }
    expect(releaseConditionsSchema.parse({ ...base, designLateralAccelMps2: 2 }).designLateralAccelMps2).toBe(2)
    const bad = releaseConditionsSchema.safeParse({ ...base, designLateralAccelMps2: 0.1 })
    expect(bad.success).toBe(false)
    expect(bad.error?.issues[0].path).toEqual(['designLateralAccelMps2'])
    expect(bad.error?.issues[0].message).toMatch(/at least 0\.5 m\/s²/)
  })
})

describe('program form: a drive tyre left blank', () => {
  it('is dropped, so leaving the fields blank changes nothing; a stated field is kept', () => {
    expect(withoutBlankTyre({ ...tractor, driveTyre: { slipStiffnessPerLoad: undefined, shapeC: undefined } })).not.toHaveProperty('driveTyre')
    expect(withoutBlankTyre({ ...tractor, driveTyre: { slipStiffnessPerLoad: 10 } }).driveTyre).toEqual({ slipStiffnessPerLoad: 10 })
  })
})

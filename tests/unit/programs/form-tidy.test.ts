import { describe, expect, it } from 'vitest'
import { tidyProgramValues } from '@/app/(app)/programs/form-tidy'
import { jsonChanges } from '@/domain/json-changes'

describe('the program form drops empty optional groups', () => {
  const stored = { params: { axleLayout: '6x4', emptyMassKg: 12_000 }, releaseConditions: { surfaces: ['ice'], loadCases: ['empty'], marginPct: 10 } }
  it('so an untouched form is no change (no parameter version that changes nothing)', () => {
    const form = { params: { ...stored.params, tandem: { interAxleTransfer: undefined, interAxleDifferential: undefined }, batteryPowerTable: null }, releaseConditions: { ...stored.releaseConditions, batteryCorners: [], minLiftOffDecelMps2: undefined } }
    expect(jsonChanges(tidyProgramValues(stored), tidyProgramValues(form))).toEqual([])
  })
  it('and keeps what was filled in', () => {
    const form = { params: { ...stored.params, tandem: { interAxleTransfer: 0.1, interAxleDifferential: undefined } }, releaseConditions: { ...stored.releaseConditions, batteryCorners: [{ label: 'Cold', socPct: 95, temperatureC: -10 }], minLiftOffDecelMps2: 0.3 } }
    expect(tidyProgramValues(form)).toEqual({
      params: { ...stored.params, tandem: { interAxleTransfer: 0.1 } },
      releaseConditions: { ...stored.releaseConditions, batteryCorners: [{ label: 'Cold', socPct: 95, temperatureC: -10 }], minLiftOffDecelMps2: 0.3 },
    })
  })
})

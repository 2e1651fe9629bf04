import { describe, expect, it } from 'vitest'
import { axleLoadsFor, cellSlip, lookup, magicFormula, simulateLaunch, simulateLiftOff, slipForForceRatio, slipGrid, SURFACES, tractionLimit, tractionLimitTorqueBySpeed, tractorTractionLimit, type PedalTrace } from '@/physics'
import { linearDriveMap, regenMap, rigid6x4, tractor } from '@/tests/support/fixtures'

describe('no input is mutated', () => {
  it('vehicle, maps, traces, coefficients and bodies are unchanged after every call', () => {
    const inputs = {
      vehicle: structuredClone(tractor), rigid: structuredClone(rigid6x4), drive: linearDriveMap(2500), regen: regenMap(800),
      pedal: { kind: 'samples', samples: [{ t: 0, pedalPct: 0 }, { t: 1, pedalPct: 100 }] } as PedalTrace,
      coeffs: { B: 10, C: 1.9, D: 1, E: 0.97 }, body: { massKg: 1e4, wheelbaseM: 5, cgToFrontAxleM: 3, cgHeightM: 1.5 },
      trailer: { massKg: 2e4, cgToKingpinM: 5, cgHeightM: 2, kingpinToAxleM: 8, fifthWheelToFrontAxleM: 3.5, fifthWheelHeightM: 1.2 },
    }
    const before = structuredClone(inputs)
    magicFormula(0.1, inputs.coeffs)
    slipForForceRatio(0.5, inputs.coeffs)
    tractionLimit(inputs.body, 0.8, { gradeRad: 0.05 })
    tractorTractionLimit(inputs.body, inputs.trailer, 0.8)
    axleLoadsFor(inputs.vehicle, 'trailer-laden')
    axleLoadsFor(inputs.rigid, 'laden')
    lookup(inputs.drive, 50, 30)
    cellSlip({ vehicle: inputs.vehicle, loadCase: 'laden', surface: 'wet-asphalt', motorTorqueNm: 1200, roadSpeedKmh: 20 })
    slipGrid({ vehicle: inputs.vehicle, loadCase: 'trailer-empty', surface: 'gravel', ...inputs.regen })
    tractionLimitTorqueBySpeed({ vehicle: inputs.rigid, loadCase: 'empty', surface: 'ice', colAxis: inputs.drive.colAxis, kind: 'drive' })
    simulateLaunch({ vehicle: inputs.vehicle, loadCase: 'laden', surface: 'packed-snow', map: inputs.drive, pedal: inputs.pedal, durationS: 2 })
    simulateLiftOff({ vehicle: inputs.rigid, loadCase: 'laden', surface: 'ice', map: inputs.regen, initialSpeedKmh: 50, durationS: 2 })
    expect(inputs).toEqual(before)
    expect(SURFACES['dry-asphalt'].passengerCarCoeffs).toEqual({ B: 10, C: 1.9, D: 1, E: 0.97 })
  })
})

import { describe, expect, it } from 'vitest'
import { chooseVersions, fieldInfo, formatValue, versionDiff } from '@/app/(app)/programs/param-diff'

const params = { axleLayout: '6x4', motorPeakPowerW: 350_000, drivelineEfficiency: 0.93, gearRatios: [3.5, 1], trailer: null }
const rc = { surfaces: ['wet-asphalt', 'packed-snow'], loadCases: ['empty', 'laden'], marginPct: 10 }

describe('parameter version diff', () => {
  it('is empty for equal versions', () => {
    expect(versionDiff({ params, releaseConditions: rc }, { params: { ...params }, releaseConditions: { ...rc } })).toEqual([])
  })

  it('labels a field from the form definitions and shows it in its display unit', () => {
    const rows = versionDiff({ params, releaseConditions: rc }, { params: { ...params, motorPeakPowerW: 400_000, drivelineEfficiency: 0.95 }, releaseConditions: rc })
    expect(rows).toEqual([
      { path: 'params.drivelineEfficiency', label: 'Driveline efficiency', unit: '%', from: '93 %', to: '95 %' },
      { path: 'params.motorPeakPowerW', label: 'Motor peak power', unit: 'kW', from: '350 kW', to: '400 kW' },
    ])
  })

  it('labels the map lookup speed (absent = road speed) and the grade requirements with their units', () => {
    const rows = versionDiff({ params, releaseConditions: rc }, { params: { ...params, mapSpeedSource: 'driven-wheel' }, releaseConditions: { ...rc, startGradePct: 18, holdGradePct: 5, holdSpeedKmh: 60 } })
    expect(rows.map((r) => [r.path, r.label, r.from, r.to])).toEqual([
      ['params.mapSpeedSource', 'Speed the maps are looked up on', 'road speed (default)', 'driven-wheel speed'],
      ['releaseConditions.startGradePct', 'Grade: steepest start, laden', '—', '18 %'],
      ['releaseConditions.holdGradePct', 'Grade: grade to hold, laden', '—', '5 %'],
      ['releaseConditions.holdSpeedKmh', 'Grade: speed to hold on it', '—', '60 km/h'],
    ])
  })

  it('names a changed gear by its number and keeps the form order', () => {
    const rows = versionDiff({ params, releaseConditions: rc }, { params: { ...params, axleLayout: '4x2', gearRatios: [3.2, 1] }, releaseConditions: { ...rc, marginPct: 15 } })
    expect(rows.map((r) => [r.path, r.label, r.from, r.to])).toEqual([
      ['params.axleLayout', 'Axle layout', '6x4', '4x2'],
      ['params.gearRatios[0]', 'Gear 1 ratio', '3.5:1', '3.2:1'],
      ['releaseConditions.marginPct', 'Release check: traction margin', '10 %', '15 %'],
    ])
  })

  it('shows surfaces and load cases as whole lists with their labels', () => {
    const rows = versionDiff({ params, releaseConditions: rc }, { params, releaseConditions: { ...rc, surfaces: ['wet-asphalt', 'ice'], loadCases: ['empty'] } })
    expect(rows).toEqual([
      { path: 'releaseConditions.surfaces', label: 'Release check: surfaces', unit: '', from: 'Wet asphalt, Packed snow', to: 'Wet asphalt, Ice' },
      { path: 'releaseConditions.loadCases', label: 'Release check: load cases', unit: '', from: 'Empty (kerb mass), Laden (gross mass)', to: 'Empty (kerb mass)' },
    ])
  })

  it('lists a coupled semitrailer as one row and then each of its fields', () => {
    const rows = versionDiff({ params, releaseConditions: rc }, { params: { ...params, trailer: { kingpinToAxleM: 7.5, grossMassKg: 34000 } }, releaseConditions: rc })
    expect(rows.map((r) => [r.path, r.from, r.to])).toEqual([
      ['params.trailer', 'none', 'coupled'],
      ['params.trailer.kingpinToAxleM', '—', '7.5 m'],
      ['params.trailer.grossMassKg', '—', '34000 kg'],
    ])
  })

  it('labels the tandem, battery-table and battery-corner fields in display units', () => {
    const rc = { surfaces: ['ice'], loadCases: ['empty'], marginPct: 10 }
    const table = { socPct: [10, 95], temperatureC: [-10, 25], chargePowerW: [[60_000, 250_000], [25_000, 120_000]], dischargePowerW: [[1, 1], [1, 1]] }
    const rows = versionDiff(
      { params: { ...params, batteryPowerTable: table }, releaseConditions: rc },
      {
        params: { ...params, tandem: { drivenLoadShare: 0.6 }, batteryPowerTable: { ...table, chargePowerW: [[60_000, 250_000], [30_000, 120_000]] } },
        releaseConditions: { ...rc, batteryCorners: [{ label: 'Full and cold', socPct: 95, temperatureC: -10 }], minLiftOffDecelMps2: 0.3 },
      },
    )
    expect(rows.map((r) => [r.label, r.from, r.to])).toEqual(expect.arrayContaining([
      ['Driven axle’s share of the group load', '—', '60 %'],
      ['Battery table: charge power, SoC row 2, temperature column 1', '25 kW', '30 kW'],
      ['Tandem details', 'none', 'given'],
      ['Release check: battery corners', '—', 'Full and cold (95 %, -10 °C)'],
      ['Release check: minimum lift-off deceleration', '—', '0.3 m/s²'],
    ]))
  })

  it('keeps an unknown path as its own label', () => {
    expect(fieldInfo('params.somethingNew')).toEqual({ label: 'params.somethingNew', unit: '', scale: 1 })
    expect(formatValue(null, fieldInfo('params.somethingNew'))).toBe('—')
  })
})

describe('choosing the versions to compare', () => {
  it('takes the newest and the one before it by default', () => {
    expect(chooseVersions([3, 2, 1], null, null)).toEqual({ from: 2, to: 3 })
    expect(chooseVersions([1], null, null)).toEqual({ from: null, to: 1 })
  })
  it('takes what was asked for, and the version before `to` when only `to` was', () => {
    expect(chooseVersions([4, 3, 2, 1], 1, 4)).toEqual({ from: 1, to: 4 })
    expect(chooseVersions([4, 3, 2, 1], null, 3)).toEqual({ from: 2, to: 3 })
    expect(chooseVersions([4, 3, 2, 1], 2, null)).toEqual({ from: 2, to: 4 })
  })
})

describe('versionDiff: the drive tyre', () => {
  it('a tyre stated on a version that had none is one row plus a row per stated field, in display units', () => {
    const rc = { surfaces: ['ice'], loadCases: ['empty'], marginPct: 10 }
    const rows = versionDiff({ params: { axleLayout: '4x2' }, releaseConditions: rc }, { params: { axleLayout: '4x2', driveTyre: { nominalLoadPerTyreN: 28_000 } }, releaseConditions: { ...rc, designLateralAccelMps2: 2 } })
    expect(rows.map((r) => [r.label, r.from, r.to])).toEqual([
      ['Drive tyre', 'default truck tyre', 'stated'],
      ['Drive tyre: Nominal load per drive tyre F_z,nom', '—', '28 kN'],
      ['Release check: design lateral acceleration', '—', '2 m/s²'],
    ])
  })
})

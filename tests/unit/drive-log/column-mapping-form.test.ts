import { describe, expect, it } from 'vitest'
import { headerNames, readFileHeader } from '@/app/_lib/reports/column-mapping/header-names'
import { guessChoices, mappingProblems, toMapping } from '@/app/_lib/reports/column-mapping/column-choices'

describe('reading a log’s header names in the browser', () => {
  it('splits the first line at the most frequent of comma, semicolon and tab, dropping quotes and a byte-order mark', () => {
    expect(headerNames('t,VehSpd,AccPed\n0,1,2\n')).toEqual(['t', 'VehSpd', 'AccPed'])
    // A decimal comma log: semicolons separate, commas are inside numbers on later lines only.
    expect(headerNames('\uFEFF"Zeit";"Geschw";Pedal\r\n0,0;1,5;2\r\n')).toEqual(['Zeit', 'Geschw', 'Pedal'])
    expect(headerNames('t\tspeed\tpedal')).toEqual(['t', 'speed', 'pedal'])
  })

  it('says why when the first line is not a header', () => {
    expect(() => headerNames('\n1,2')).toThrow(/first line is empty/)
    expect(() => headerNames('just one name\n')).toThrow(/no comma, semicolon or tab/)
  })

  it('reads only the start of a file', async () => {
    const big = new Blob(['a;b;c\n', '1;2;3\n'.repeat(200_000)])
    expect(await readFileHeader(big)).toEqual(['a', 'b', 'c'])
  })
})

describe('the column choices', () => {
  const headers = ['t', 'VehSpd', 'wheel_speed_left_kmh', 'WhlR', 'AccPed', 'Road_Speed_MPH']

  it('guesses headers that already carry our names (any case), and keeps an earlier mapping', () => {
    expect(guessChoices(headers)).toEqual({
      wheelLeft: { header: 'wheel_speed_left_kmh', column: 'wheel_speed_left_kmh' },
      roadSpeed: { header: 'Road_Speed_MPH', column: 'road_speed_mph' },
    })
    expect(guessChoices(headers, { road_speed_kmh: 'vehspd', time_s: 'gone' }).roadSpeed).toEqual({ header: 'VehSpd', column: 'road_speed_kmh' })
  })

  it('names each missing required quantity, a regen-only set’s brake pedal, and a header picked twice', () => {
    expect(mappingProblems({}, false)).toEqual(['Time is required', 'Road speed (non-driven axle or satellite) is required', 'Accelerator pedal is required', 'At least one drive-wheel speed is required'])
    const c = { time: { header: 't', column: 'time_s' }, roadSpeed: { header: 'VehSpd', column: 'road_speed_kmh' }, accelPedal: { header: 'AccPed', column: 'accel_pedal_pct' }, wheelRight: { header: 'WhlR', column: 'wheel_speed_right_kmh' } }
    expect(mappingProblems(c, false)).toEqual([])
    expect(mappingProblems(c, true)).toEqual(['Brake pedal is required'])
    expect(mappingProblems({ ...c, yawRate: { header: 'vehspd', column: 'yaw_rate_deg_s' } }, false)).toEqual(['“vehspd” is picked for both road speed (non-driven axle or satellite) and yaw rate (positive turning left)'])
    expect(toMapping(c)).toEqual({ time_s: 't', road_speed_kmh: 'VehSpd', accel_pedal_pct: 'AccPed', wheel_speed_right_kmh: 'WhlR' })
  })
})

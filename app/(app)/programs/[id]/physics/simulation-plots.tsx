'use client'
/** Time plots of a simulation: speeds, slip against the tyre peak, motor torque, acceleration and jerk. */
import { TimePlot } from '@/app/_components/plots/time-plot'
import type { UnitSet } from '@/maps'
import type { SimulationResponse } from '@/app/_lib/physics/simulate'

export function SimulationPlots({ result, units: u, filename }: { result: SimulationResponse; units: UnitSet; filename: string }) {
  const s = result.series
  const peak = result.summary.tyrePeakSlip
  const peakRef = peak === null ? [] : [result.mode === 'launch' ? { y: peak, label: 'tyre peak' } : { y: -peak, label: 'tyre peak' }]
  return (
    <div className="grid gap-3 lg:grid-cols-2" data-testid="simulation-plots">
      <TimePlot t={s.t} title="Vehicle and wheel speed" yLabel={`Speed (${u.speed})`} filename={`${filename}-speed`}
        lines={[{ name: 'vehicle', y: s.speedKmh.map(u.speedOut), colour: '#24406e' }, { name: 'wheel (tread)', y: s.wheelSpeedKmh.map(u.speedOut), colour: '#d97706', dash: 'dash' }]} />
      <TimePlot t={s.t} title="Drive-axle slip ratio" yLabel="Slip ratio (–)" filename={`${filename}-slip`} refs={peakRef}
        lines={[{ name: 'slip', y: s.slip, colour: '#0f6b5c' }]} />
      <TimePlot t={s.t} title="Motor torque" yLabel={`Torque (${u.torque})`} filename={`${filename}-torque`}
        lines={[{ name: 'motor', y: s.motorTorqueNm.map(u.torqueOut), colour: '#2e8092' }]} />
      <TimePlot t={s.t} title="Acceleration" yLabel="Acceleration (m/s²)" filename={`${filename}-accel`}
        lines={[{ name: 'acceleration', y: s.accelMps2, colour: '#24406e' }]} />
      <TimePlot t={s.t} title="Jerk" yLabel="Jerk (m/s³)" filename={`${filename}-jerk`}
        lines={[{ name: 'jerk', y: s.jerkMps3, colour: '#9f2a1f' }]} />
      {result.mode === 'launch' && (
        <TimePlot t={s.t} title="Pedal" yLabel="Pedal (%)" filename={`${filename}-pedal`} lines={[{ name: 'pedal', y: s.pedalPct, colour: '#64748b' }]} />
      )}
    </div>
  )
}

'use client'
/** Traces of one drivability run: motor torque, jerk against the comfort limit, slip against the tyre peak, speeds. */
import { TimePlot } from '@/app/_components/plots/time-plot'

export interface DrivabilitySeries { t: number[]; speedKmh: number[]; wheelSpeedKmh: number[]; slip: number[]; motorTorqueNm: number[]; jerkMps3: number[] }

export function DrivabilityPlots({ series: s, filename, tyrePeakSlip, jerkLimit }: { series: DrivabilitySeries; filename: string; tyrePeakSlip: number | null; jerkLimit: number }) {
  return (
    <div className="grid gap-3 lg:grid-cols-2" data-testid="drivability-plots">
      <TimePlot t={s.t} title="Motor torque" yLabel="Torque (N·m)" filename={`${filename}-torque`} lines={[{ name: 'motor', y: s.motorTorqueNm, colour: '#2e8092' }]} />
      <TimePlot t={s.t} title="Longitudinal jerk" yLabel="Jerk (m/s³)" filename={`${filename}-jerk`} refs={[{ y: jerkLimit, label: 'limit' }, { y: -jerkLimit, label: 'limit' }]}
        lines={[{ name: 'jerk', y: s.jerkMps3, colour: '#9f2a1f' }]} />
      <TimePlot t={s.t} title="Drive-axle slip ratio" yLabel="Slip ratio (–)" filename={`${filename}-slip`} refs={tyrePeakSlip === null ? [] : [{ y: tyrePeakSlip, label: 'tyre peak' }, { y: -tyrePeakSlip, label: 'tyre peak' }]}
        lines={[{ name: 'slip', y: s.slip, colour: '#0f6b5c' }]} />
      <TimePlot t={s.t} title="Vehicle and wheel speed" yLabel="Speed (km/h)" filename={`${filename}-speed`}
        lines={[{ name: 'vehicle', y: s.speedKmh, colour: '#24406e' }, { name: 'wheel (tread)', y: s.wheelSpeedKmh, colour: '#d97706', dash: 'dash' }]} />
    </div>
  )
}

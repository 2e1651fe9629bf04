'use client'
/** The replay over time: both sets' torque requests, and predicted against measured slip. */
import { TimePlot } from '@/app/_components/plots/time-plot'
import type { ReplayResult } from '@/physics/replay'

export function ReplayPlots({ series: s, drivenLabel, candidateLabel, filename }: { series: ReplayResult['series']; drivenLabel: string; candidateLabel: string; filename: string }) {
  const nan = (xs: (number | null)[]) => xs.map((x) => (x === null ? NaN : x))
  return (
    <div className="grid gap-3 lg:grid-cols-2" data-testid="replay-plots">
      <TimePlot t={s.t} title="Torque request" yLabel="Motor torque (N·m)" filename={`${filename}-torque`}
        lines={[{ name: drivenLabel, y: s.drivenNm, colour: '#64748b' }, { name: candidateLabel, y: s.candidateNm, colour: '#2e8092', dash: 'dash' }]} />
      <TimePlot t={s.t} title="Slip ratio" yLabel="Slip ratio (–)" filename={`${filename}-slip`}
        lines={[{ name: 'measured', y: nan(s.measuredSlip), colour: '#24406e' }, { name: `predicted, ${candidateLabel}`, y: nan(s.predictedSlip), colour: '#9f2a1f', dash: 'dash' }]} />
    </div>
  )
}

'use client'
import { useQuery } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import type { AnalysisResult } from '@/physics'
import type { StoredAnalysis } from '@/app/_lib/reports/log-jobs'
import { EventTable } from './event-table'
import { LogSlipBasis } from './log-slip-basis'
import { LogTimePlot } from './log-time-plot'
import { OccupancyGrid } from './occupancy-grid'
import { PredictionTable, type Prediction } from './prediction-table'

const fmt = (v: number | null | undefined, d = 2) => (v === null || v === undefined ? '—' : v.toFixed(d))

/**
 * A log's analysis: what it was analysed against (the report's set), summary figures, the wheel-spin
 * and lock-up events, the plot, the model's predictions and the map occupancy.
 */
export function LogAnalysisView(props: { reportId: number; logId: number; setId: number }) {
  const q = useQuery({
    queryKey: ['log', props.logId],
    queryFn: () => api<{ log: { analysis: (AnalysisResult & Pick<StoredAnalysis, 'basis'>) | null }; predictions: Prediction[] | null }>(`/api/reports/${props.reportId}/logs/${props.logId}`),
  })
  const a = q.data?.log.analysis
  if (!a) return <p className="text-sm text-slate-500">Loading analysis…</p>
  const basis = a.basis
  const occupancyKind = a.occupancy?.kind ?? basis?.occupancyMap ?? 'drive'
  const spins = a.events.filter((e) => e.kind === 'spin').length
  const locks = a.events.length - spins
  return (
    <div className="space-y-3">
      {basis && (
        <p className="text-xs text-slate-600" data-testid="analysis-basis">
          Analysed against set {basis.setNumber} (parameter version {basis.paramVersion}); time in cells on its {basis.occupancyMap} map.
        </p>
      )}
      {basis && basis.setId !== props.setId && (
        <p role="alert" className="error-text text-sm">This analysis was made against set {basis.setNumber}, before the report’s set was corrected; press “Analyse again” to see it against the report’s set.</p>
      )}
      <dl className="grid grid-cols-2 gap-2 text-sm sm:grid-cols-4" data-testid="log-summary">
        <Fig label="Duration" value={`${fmt(a.durationS / 60, 1)} min`} />
        <Fig label="Distance" value={`${fmt(a.distanceKm, 1)} km`} />
        <Fig label="Top speed" value={`${fmt(a.maxRoadSpeedKmh, 1)} km/h`} />
        <Fig label="Samples" value={a.samples.toLocaleString('en')} />
        <Fig label="Wheel-spin events" value={String(spins)} testId="spin-count" />
        <Fig label="Lock-up events" value={String(locks)} testId="lock-count" />
        <Fig label="Peak slip" value={fmt(a.slip.max, 3)} />
        <Fig label="|slip| p95" value={fmt(a.slip.p95Abs, 3)} />
        {a.energy && <Fig label="Energy drawn / regenerated" value={`${fmt(a.energy.drawnKWh, 1)} / ${fmt(a.energy.regeneratedKWh, 1)} kWh`} />}
      </dl>
      <LogTimePlot analysis={a} />
      <EventTable events={a.events} />
      {q.data?.predictions && <PredictionTable predictions={q.data.predictions} />}
      {a.occupancy && <OccupancyGrid occupancy={a.occupancy} events={a.events} mapKind={occupancyKind} />}
      <LogSlipBasis a={a} />
    </div>
  )
}

function Fig({ label, value, testId }: { label: string; value: string; testId?: string }) {
  return (
    <div className="rounded border border-line px-2 py-1">
      <dt className="text-xs text-slate-500">{label}</dt>
      <dd className="font-semibold tabular-nums" data-testid={testId}>{value}</dd>
    </div>
  )
}

'use client'
/**
 * The compare page body: both surfaces side by side with one camera and one colour range, the
 * difference B − A with the table of changed cells, the slip heat maps for the chosen load case
 * and surface, and (for editors) a traction-safe draft of B.
 */
import Link from 'next/link'
import { useMemo, useState } from 'react'
import { OverlayControls } from '@/app/_components/plots/overlay-controls'
import { ProposalPanel } from '@/app/_components/plots/proposal-panel'
import { SlipHeatmap } from '@/app/_components/plots/slip-heatmap'
import { UNITS } from '@/maps'
import { useOverlay } from '@/app/_components/plots/use-overlay'
import { useQueryState } from '@/app/_components/plots/use-query-state'
import type { CompareViewData } from './compare-data'
import { CompareSurfaces } from './compare-surfaces'

export function CompareView(props: CompareViewData & { canEdit: boolean }) {
  const { a, b, diff, initialChoice, initialOverlays } = props
  const [choice, setChoice] = useQueryState(initialChoice)
  const [showLimit, setShowLimit] = useState(true)
  const units = UNITS[choice.units]
  const oa = useOverlay(a.mapId, a.number, choice, { choice: initialChoice, overlay: initialOverlays.a })
  const ob = useOverlay(b.mapId, b.number, choice, { choice: initialChoice, overlay: initialOverlays.b })
  const label = (s: typeof a) => `${s.mapName} r${s.number}`
  const rows = useMemo(() => diff.changed.map((c) => ({ pedalPct: c.pedalPct, speedKmh: c.speedKmh, before: c.before, after: c.after })), [diff])
  const failed = oa.error ?? ob.error
  return (
    <div className="space-y-4">
      <div className="card space-y-1 text-sm">
        <p><strong>A</strong> <Link className="text-accent hover:underline" href={`/maps/${a.mapId}`}>{label(a)}</Link> — {a.message}</p>
        <p><strong>B</strong> <Link className="text-accent hover:underline" href={`/maps/${b.mapId}`}>{label(b)}</Link> — {b.message}</p>
        <p className="text-slate-600">
          {props.programName} · {props.kind} map · {diff.changed.length} of {diff.cellCount} cells changed
          {diff.axesDiffer && ' · the breakpoints differ, so B was resampled onto A’s breakpoints'}
        </p>
      </div>
      <div className="card flex flex-wrap items-end gap-4">
        <OverlayControls value={choice} loadCases={props.loadCases} onChange={setChoice} />
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={showLimit} onChange={(e) => setShowLimit(e.target.checked)} /> Show the traction limit over the surfaces
        </label>
      </div>
      <CompareSurfaces a={a} b={b} diff={diff} units={units} limits={showLimit ? { a: oa.data, b: ob.data } : null} rows={rows} />
      <section className="space-y-2">
        <h2 className="text-lg font-semibold">Predicted slip</h2>
        {failed && <p className="error-text" role="alert">{failed.message}</p>}
        <div className="grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
          {oa.data && <div className="card"><SlipHeatmap table={a.table} overlay={oa.data} units={units} title={`A: ${label(a)}`} filename={`slip-${a.mapId}-r${a.number}`} testId="slip-heatmap-a" /></div>}
          {ob.data && <div className="card"><SlipHeatmap table={b.table} overlay={ob.data} units={units} title={`B: ${label(b)}`} filename={`slip-${b.mapId}-r${b.number}`} testId="slip-heatmap-b" /></div>}
        </div>
      </section>
      {props.canEdit && <ProposalPanel mapId={b.mapId} mapName={b.mapName} baseNumber={b.number} choice={choice} units={units} />}
    </div>
  )
}

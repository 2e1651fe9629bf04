/** The colour scale's key: a gradient bar with its ends in the current torque unit. */
import type { ColourScale } from './colour-scale'
import { humanNumber, type UnitSet } from '@/maps'

export function ColourLegend({ scale, units, ceiling }: { scale: ColourScale; units: UnitSet; ceiling?: string }) {
  return (
    <div className="flex items-center gap-2 text-xs text-slate-600" aria-label="Colour scale">
      <span>{humanNumber(units.torqueOut(scale.min))}</span>
      <span className="h-3 w-40 rounded-sm border border-line" style={{ background: scale.gradient }} />
      <span>
        {humanNumber(units.torqueOut(scale.max))} {units.torque}
        {ceiling && ` (${ceiling})`}
      </span>
      <span className="ml-3 inline-flex items-center gap-1">
        <span className="inline-block h-3 w-3 border-2 border-danger" /> error
      </span>
      <span className="inline-flex items-center gap-1">
        <span className="inline-block h-3 w-3 border-2 border-dashed border-warn" /> warning (hover a cell for the reason)
      </span>
    </div>
  )
}

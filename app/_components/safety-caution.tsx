/** The plain caution every release, export and physics page carries. */
export const SAFETY_CAUTION =
  'The physics in Mapwright is an estimate. A torque map must be proven on a closed course before it is used on public roads. ' +
  'Local regulations, the vehicle maker’s functional-safety process and licensed engineering practice come first.'

export function SafetyCaution({ className = '' }: { className?: string }) {
  return (
    <aside role="note" className={`rounded-md border border-amber-300 bg-amber-50 px-3 py-2 text-sm text-amber-900 ${className}`}>
      <strong className="font-semibold">Caution: </strong>
      {SAFETY_CAUTION}
    </aside>
  )
}

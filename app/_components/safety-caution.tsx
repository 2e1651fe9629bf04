import { SAFETY_CAUTION as CAUTION_LINES } from '@/maps'

/** The plain caution every release, export and physics page carries: the same words as the exports. */
export const SAFETY_CAUTION = CAUTION_LINES.slice(1).join(' ').replace('; this file does not replace any of them', '')

export function SafetyCaution({ className = '' }: { className?: string }) {
  return (
    <aside role="note" className={`rounded-md border border-amber-300 bg-amber-50 px-3 py-2 text-sm text-amber-900 ${className}`}>
      <strong className="font-semibold">Caution: </strong>
      {SAFETY_CAUTION}
    </aside>
  )
}

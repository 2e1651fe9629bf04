'use client'
/** Metric / imperial display switch. Only the display changes; stored values stay SI. */
import type { UnitSystem } from '@/maps'

export function UnitSwitch({ value, onChange }: { value: UnitSystem; onChange: (u: UnitSystem) => void }) {
  const option = (u: UnitSystem, label: string) => (
    <label className={`cursor-pointer px-2 py-1 ${value === u ? 'bg-accent text-white' : 'bg-white hover:bg-accent-soft'}`}>
      <input type="radio" name="units" className="sr-only" checked={value === u} onChange={() => onChange(u)} />
      {label}
    </label>
  )
  return (
    <fieldset className="inline-flex overflow-hidden rounded-md border border-line text-xs font-medium">
      <legend className="sr-only">Units</legend>
      {option('metric', 'N·m, km/h')}
      {option('imperial', 'lbf·ft, mph')}
    </fieldset>
  )
}

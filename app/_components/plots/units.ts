/**
 * Display units of the plots. Stored numbers are always N·m and km/h; plots convert on the way out
 * with the exact factors of physics/units.ts, so a unit switch never changes data.
 */
import { kmhToMph, nmToLbfFt } from '@/physics/units'

export type UnitSystem = 'metric' | 'imperial'

export interface PlotUnits {
  system: UnitSystem
  torque: string
  speed: string
  torqueOut: (nm: number) => number
  speedOut: (kmh: number) => number
}

export const PLOT_UNITS: Record<UnitSystem, PlotUnits> = {
  metric: { system: 'metric', torque: 'N·m', speed: 'km/h', torqueOut: (v) => v, speedOut: (v) => v },
  imperial: { system: 'imperial', torque: 'lbf·ft', speed: 'mph', torqueOut: nmToLbfFt, speedOut: kmhToMph },
}

/** A unit system from a query value; anything else is metric. */
export const unitSystem = (v: string | null | undefined): UnitSystem => (v === 'imperial' ? 'imperial' : 'metric')

const one = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 })
const whole = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 })

/** A number for tables and labels: thousands separators, at most one decimal. */
export const fmt1 = (n: number): string => (Number.isFinite(n) ? one.format(n) : '—')
/** A whole number with thousands separators. */
export const fmt0 = (n: number): string => (Number.isFinite(n) ? whole.format(n) : '—')

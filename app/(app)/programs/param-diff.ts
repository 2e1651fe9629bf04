import { jsonChanges, type JsonChange } from '@/domain/json-changes'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'
import { DRIVE_TYRE_FIELDS, TRAILER_FIELDS, VEHICLE_FIELDS } from './program-fields'

/** What one parameter version holds, as far as the diff is concerned (plain JSON). */
export interface VersionContent {
  params: unknown
  releaseConditions: unknown
}

/** One changed field between two parameter versions, ready to show: values in the form's display units. */
export interface DiffRow {
  /** Where the value sits in the stored JSON, e.g. `params.trailer.kingpinToAxleM`. */
  path: string
  label: string
  unit: string
  from: string
  to: string
}

interface FieldInfo {
  label: string
  unit: string
  scale: number
  kind?: 'surfaces' | 'loadCases' | 'trailer' | 'driveTyre' | 'corners' | 'group' | 'mapSpeed'
}

const FIELDS: Record<string, FieldInfo> = { 'params.axleLayout': { label: 'Axle layout', unit: '', scale: 1 } }
for (const g of VEHICLE_FIELDS) {
  for (const f of g.fields) FIELDS[`params.${f.key}`] = { label: f.label, unit: f.unit, scale: f.scale ?? 1 }
  if (g.group === 'Driveline and motor') FIELDS['params.gearRatios'] = { label: 'Gear ratios, lowest first', unit: ':1', scale: 1 }
}
FIELDS['params.gearRatios'] ??= { label: 'Gear ratios, lowest first', unit: ':1', scale: 1 }
FIELDS['params.mapSpeedSource'] = { label: 'Speed the maps are looked up on', unit: '', scale: 1, kind: 'mapSpeed' }
FIELDS['params.tandem'] = { label: 'Tandem details', unit: '', scale: 1, kind: 'group' }
FIELDS['params.batteryPowerTable'] = { label: 'Battery power table', unit: '', scale: 1, kind: 'group' }
FIELDS['params.tandem.interAxleDifferential'] = { label: 'Inter-axle differential', unit: '', scale: 1 }
FIELDS['params.tandem.drivenAxle'] = { label: 'Driven axle of the tandem', unit: '', scale: 1 }
FIELDS['params.tandem.drivenLoadShare'] = { label: 'Driven axle’s share of the group load', unit: '%', scale: 0.01 }
FIELDS['params.tandem.interAxleTransfer'] = { label: 'Inter-axle load transfer', unit: 'N/N', scale: 1 }
FIELDS['params.batteryPowerTable.socPct'] = { label: 'Battery table: state-of-charge breakpoints', unit: '%', scale: 1 }
FIELDS['params.batteryPowerTable.temperatureC'] = { label: 'Battery table: temperature breakpoints', unit: '°C', scale: 1 }
FIELDS['params.trailer'] = { label: 'Semitrailer', unit: '', scale: 1, kind: 'trailer' }
for (const f of TRAILER_FIELDS) FIELDS[`params.trailer.${f.key}`] = { label: f.label, unit: f.unit, scale: 1 }
FIELDS['params.driveTyre'] = { label: 'Drive tyre', unit: '', scale: 1, kind: 'driveTyre' }
for (const f of DRIVE_TYRE_FIELDS) FIELDS[`params.driveTyre.${f.key}`] = { label: `Drive tyre: ${f.label}`, unit: f.unit, scale: f.scale ?? 1 }
FIELDS['releaseConditions.surfaces'] = { label: 'Release check: surfaces', unit: '', scale: 1, kind: 'surfaces' }
FIELDS['releaseConditions.loadCases'] = { label: 'Release check: load cases', unit: '', scale: 1, kind: 'loadCases' }
FIELDS['releaseConditions.marginPct'] = { label: 'Release check: traction margin', unit: '%', scale: 1 }
FIELDS['releaseConditions.designLateralAccelMps2'] = { label: 'Release check: design lateral acceleration', unit: 'm/s²', scale: 1 }
FIELDS['releaseConditions.batteryCorners'] = { label: 'Release check: battery corners', unit: '', scale: 1, kind: 'corners' }
FIELDS['releaseConditions.minLiftOffDecelMps2'] = { label: 'Release check: minimum lift-off deceleration', unit: 'm/s²', scale: 1 }
FIELDS['releaseConditions.maxPeakJerkMps3'] = { label: 'Comfort: largest peak jerk', unit: 'm/s³', scale: 1 }
FIELDS['releaseConditions.maxTimeTo90S'] = { label: 'Comfort: longest time to 90 % torque', unit: 's', scale: 1 }
FIELDS['releaseConditions.comfortSource'] = { label: 'Comfort: source of the limits', unit: '', scale: 1 }
FIELDS['releaseConditions.replayMarginNm'] = { label: 'Release check: replay margin over the evidence', unit: 'N·m', scale: 1 }
FIELDS['releaseConditions.startGradePct'] = { label: 'Grade: steepest start, laden', unit: '%', scale: 1 }
FIELDS['releaseConditions.holdGradePct'] = { label: 'Grade: grade to hold, laden', unit: '%', scale: 1 }
FIELDS['releaseConditions.holdSpeedKmh'] = { label: 'Grade: speed to hold on it', unit: 'km/h', scale: 1 }

/** Rows follow the program form's order; a gear sits with the gear ratios, unknown paths come last. */
const ORDER = Object.keys(FIELDS)
const rank = (path: string) => {
  const i = ORDER.indexOf(path.replace(/\[\d+\]$/, ''))
  return i === -1 ? ORDER.length : i
}

/** The label and display unit of a stored path; a gear's index becomes its number, an unknown path stays as it is. */
export function fieldInfo(path: string): FieldInfo {
  const known = FIELDS[path]
  if (known) return known
  const gear = /^params\.gearRatios\[(\d+)\]$/.exec(path)
  if (gear) return { label: `Gear ${Number(gear[1]) + 1} ratio`, unit: ':1', scale: 1 }
  const corner = /^releaseConditions\.batteryCorners\[(\d+)\]\.(label|socPct|temperatureC)$/.exec(path)
  if (corner) return { label: `Release check: battery corner ${Number(corner[1]) + 1} ${({ label: 'name', socPct: 'state of charge', temperatureC: 'temperature' } as const)[corner[2] as 'label']}`, unit: ({ label: '', socPct: '%', temperatureC: '°C' } as const)[corner[2] as 'label'], scale: 1 }
  const power = /^params\.batteryPowerTable\.(charge|discharge)PowerW\[(\d+)\]\[(\d+)\]$/.exec(path)
  if (power) return { label: `Battery table: ${power[1]} power, SoC row ${Number(power[2]) + 1}, temperature column ${Number(power[3]) + 1}`, unit: 'kW', scale: 1000 }
  return { label: path, unit: '', scale: 1 }
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v)

/** Hide float noise such as 0.9300000000000001 after a scale. */
const tidy = (v: number) => Number(v.toPrecision(12))

/** A stored value in the field's display unit: `93 %`, `4.1:1`, `Wet asphalt, Ice`, `—` for none. */
export function formatValue(value: unknown, info: Pick<FieldInfo, 'unit' | 'scale' | 'kind'>): string {
  if (info.kind === 'mapSpeed') return value === 'driven-wheel' ? 'driven-wheel speed' : value === 'road' ? 'road speed' : 'road speed (default)'
  if (value === null || value === undefined) return info.kind === 'trailer' || info.kind === 'group' ? 'none' : info.kind === 'driveTyre' ? 'default truck tyre' : '—'
  if (info.kind === 'group') return isObject(value) ? 'given' : String(value)
  if (info.kind === 'trailer') return isObject(value) ? 'coupled' : String(value)
  if (info.kind === 'driveTyre') return isObject(value) ? 'stated' : String(value)
  if (info.kind === 'surfaces' && Array.isArray(value)) return value.length ? value.map((s) => surfaceLabel(String(s))).join(', ') : 'none'
  if (info.kind === 'corners' && Array.isArray(value))
    return value.length ? value.map((c) => (isObject(c) ? `${String(c.label)} (${String(c.socPct)} %, ${String(c.temperatureC)} °C)` : String(c))).join('; ') : 'none'
  if (info.kind === 'loadCases' && Array.isArray(value)) return value.length ? value.map((c) => loadCaseLabel(String(c))).join(', ') : 'none'
  const unit = (n: string) => (info.unit === '' ? n : info.unit.startsWith(':') ? `${n}${info.unit}` : `${n} ${info.unit}`)
  if (typeof value === 'number') return unit(String(tidy(value / info.scale)))
  if (Array.isArray(value)) return value.map((v) => (typeof v === 'number' ? unit(String(tidy(v / info.scale))) : String(v))).join(', ')
  if (typeof value === 'string') return value
  return JSON.stringify(value)
}

/**
 * Field-by-field changes from one parameter version to another (jsonChanges over params and release
 * conditions), with labels and display units from the program form's field list. A semitrailer that
 * is coupled or uncoupled is one row plus a row per trailer field; the surfaces and load cases are
 * each one row with the whole list before and after.
 * @example versionDiff(v1, v2) // [{ path: 'params.motorPeakPowerW', label: 'Motor peak power', unit: 'kW', from: '350 kW', to: '400 kW' }]
 */
export function versionDiff(before: VersionContent, after: VersionContent): DiffRow[] {
  const a = { params: before.params, releaseConditions: before.releaseConditions }
  const b = { params: after.params, releaseConditions: after.releaseConditions }
  const lists = ['releaseConditions.surfaces', 'releaseConditions.loadCases']
  const listChanged = new Set<string>()
  const changes: JsonChange[] = []
  for (const c of jsonChanges(a, b)) {
    const list = lists.find((p) => c.path === p || c.path.startsWith(`${p}[`))
    if (list) {
      listChanged.add(list)
      continue
    }
    // An object that appears or disappears (a semitrailer coupled or removed): say so, then each of its fields.
    if ((isObject(c.from) && !isObject(c.to)) || (!isObject(c.from) && isObject(c.to))) {
      changes.push(c, ...jsonChanges(isObject(c.from) ? c.from : {}, isObject(c.to) ? c.to : {}, c.path))
      continue
    }
    changes.push(c)
  }
  const pick = (o: unknown, path: string) => path.split('.').reduce<unknown>((v, k) => (isObject(v) ? v[k] : undefined), o)
  const rows = [...changes.map((c) => row(c.path, c.from, c.to)), ...lists.filter((p) => listChanged.has(p)).map((p) => row(p, pick(a, p), pick(b, p)))]
  // Stable sort: within one rank (the gears of gearRatios) jsonChanges' order stays.
  return rows.map((r, i) => ({ r, i })).sort((x, y) => rank(x.r.path) - rank(y.r.path) || x.i - y.i).map((x) => x.r)
}

function row(path: string, from: unknown, to: unknown): DiffRow {
  const info = fieldInfo(path)
  return { path, label: info.label, unit: info.unit, from: formatValue(from, info), to: formatValue(to, info) }
}

/**
 * Which two versions to compare: the ones asked for, else the newest (or the `to` asked for) against
 * the version before it; null where there is none.
 * @example chooseVersions([3, 2, 1], null, null) // { from: 2, to: 3 }
 */
export function chooseVersions(numbers: number[], from: number | null, to: number | null): { from: number | null; to: number | null } {
  const newest = numbers.length ? Math.max(...numbers) : null
  const t = to ?? newest
  const before = numbers.filter((n) => t !== null && n < t)
  return { from: from ?? (before.length ? Math.max(...before) : null), to: t }
}

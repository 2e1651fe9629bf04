/**
 * The column-mapping form's model: one row per quantity we read, with the file's header picked for
 * it and, where the quantity comes in more than one unit, which of our columns (unit) it is.
 * Turned into the `{ ourColumn: theirHeader }` mapping the upload and the retry send.
 */
import { DRIVE_LOG_COLUMNS, REQUIRED_CHANNELS, WHEEL_CHANNELS, type LogChannel, type LogColumnSpec } from '@/physics/drive-log/columns'

export interface ChannelRow {
  channel: LogChannel
  label: string
  /** 'yes': the log must have it; 'wheel': at least one drive-wheel row; 'regen': when the set holds no drive map. */
  required: 'yes' | 'wheel' | 'regen' | 'no'
  /** Our column names for this quantity, preferred unit first. */
  columns: readonly LogColumnSpec[]
}

const LABELS: Record<LogChannel, string> = {
  time: 'Time',
  roadSpeed: 'Road speed (non-driven axle or satellite)',
  accelPedal: 'Accelerator pedal',
  brakePedal: 'Brake pedal',
  wheel: 'Drive-wheel speed (one value for the axle)',
  wheelLeft: 'Left drive wheel speed',
  wheelRight: 'Right drive wheel speed',
  wheelLeft2: 'Left wheel speed, second drive axle',
  wheelRight2: 'Right wheel speed, second drive axle',
  motorTorque: 'Motor torque',
  motorSpeed: 'Motor speed',
  batteryCurrent: 'Battery current',
  batteryVoltage: 'Battery voltage',
  yawRate: 'Yaw rate (positive turning left)',
}

const ORDER: readonly LogChannel[] = ['time', 'roadSpeed', 'accelPedal', ...WHEEL_CHANNELS, 'brakePedal', 'motorTorque', 'motorSpeed', 'batteryCurrent', 'batteryVoltage', 'yawRate']

/** Every quantity, in the order the form lists them. */
export const CHANNEL_ROWS: readonly ChannelRow[] = ORDER.map((channel) => ({
  channel,
  label: LABELS[channel],
  required: REQUIRED_CHANNELS.includes(channel) ? 'yes' : (WHEEL_CHANNELS as readonly LogChannel[]).includes(channel) ? 'wheel' : channel === 'brakePedal' ? 'regen' : 'no',
  columns: DRIVE_LOG_COLUMNS.filter((c) => c.channel === channel),
}))

/** What the driver picked for one quantity: the file's header and our column (its unit). */
export interface Choice { header: string; column: string }
export type Choices = Partial<Record<LogChannel, Choice>>

const norm = (s: string) => s.trim().toLowerCase()

/**
 * The first guess: a header that already is one of our column names (any case) is picked for its
 * quantity, and a mapping sent before (a retry) is kept where its header is still in the file.
 */
export function guessChoices(headers: readonly string[], previous: Record<string, string> = {}): Choices {
  const out: Choices = {}
  const byName = new Map(DRIVE_LOG_COLUMNS.map((c) => [c.name, c]))
  for (const [ours, theirs] of Object.entries(previous)) {
    const spec = byName.get(ours)
    const header = headers.find((h) => norm(h) === norm(theirs))
    if (spec && header && !out[spec.channel]) out[spec.channel] = { header, column: spec.name }
  }
  const used = new Set(Object.values(out).map((c) => norm(c.header)))
  for (const spec of DRIVE_LOG_COLUMNS) {
    const header = headers.find((h) => norm(h) === spec.name)
    if (header && !out[spec.channel] && !used.has(norm(header))) {
      out[spec.channel] = { header, column: spec.name }
      used.add(norm(header))
    }
  }
  return out
}

/** The mapping to send: `{ ourColumn: theirHeader }` for each quantity picked. */
export function toMapping(choices: Choices): Record<string, string> {
  return Object.fromEntries(Object.values(choices).filter((c): c is Choice => Boolean(c?.header)).map((c) => [c.column, c.header]))
}

/** What is still wrong with the choices, in words for the form; empty when the log can be read. */
export function mappingProblems(choices: Choices, needsBrake: boolean): string[] {
  const problems = CHANNEL_ROWS.filter((r) => r.required === 'yes' || (needsBrake && r.required === 'regen'))
    .filter((r) => !choices[r.channel])
    .map((r) => `${r.label} is required`)
  if (!WHEEL_CHANNELS.some((ch) => choices[ch])) problems.push('At least one drive-wheel speed is required')
  const seen = new Map<string, LogChannel>()
  for (const r of CHANNEL_ROWS) {
    const c = choices[r.channel]
    if (!c) continue
    const other = seen.get(norm(c.header))
    if (other) problems.push(`“${c.header}” is picked for both ${LABELS[other].toLowerCase()} and ${r.label.toLowerCase()}`)
    else seen.set(norm(c.header), r.channel)
  }
  return problems
}

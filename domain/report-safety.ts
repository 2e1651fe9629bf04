/** A drive report's safety concern: none, open (a severity-4 flag opened it) or resolved by a lead (drive_reports.safety). */
export const SAFETY_STATES = ['none', 'open', 'resolved'] as const
export type SafetyState = (typeof SAFETY_STATES)[number]

export const SAFETY_LABELS: Readonly<Record<SafetyState, string>> = {
  none: 'no safety concern',
  open: 'safety concern open',
  resolved: 'safety concern resolved',
}

/** Severities of a flag on a drive report; a severity-4 flag is a safety concern and opens the report's concern. */
export const FLAG_SEVERITIES = [1, 2, 3, 4] as const
export type FlagSeverity = (typeof FLAG_SEVERITIES)[number]
export const SAFETY_SEVERITY = 4 satisfies FlagSeverity

export const SEVERITY_LABELS: Readonly<Record<FlagSeverity, string>> = { 1: 'Note', 2: 'Annoying', 3: 'Must fix', 4: 'Safety concern' }

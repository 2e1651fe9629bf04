import 'server-only'
import { emailsOfRole, type OutgoingMail } from '@/db/queries/mail'
import { SAFETY_SEVERITY } from '@/domain/report-safety'
import { engineersOfMap } from '@/db/queries/reports'
import type { MapSetFull } from '@/db/queries/sets'
import type { ReportInput } from '@/app/_schemas/report'
import { appUrl, nudgeMail } from '../mail/sender'
import type { SessionUser } from '../auth/session'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'

/**
 * The e-mail for a new safety concern: to the lead engineers and the engineers of the set's maps
 * the severity-4 flags are on, naming the set and those maps' revisions.
 */
export async function safetyMailFor(input: ReportInput, set: MapSetFull, driver: SessionUser): Promise<(id: number) => OutgoingMail> {
  const safety = input.flags.filter((f) => f.severity === SAFETY_SEVERITY)
  const parts = [set.drive, set.regen].filter((p) => p !== null && safety.some((f) => f.map === p.kind))
  const engineers = (await Promise.all(parts.map((p) => engineersOfMap(p!.mapId)))).flat()
  const to = [...new Set([...(await emailsOfRole('lead_engineer')), ...engineers])]
  const onMaps = parts.map((p) => `${p!.mapName} r${p!.number}`).join(', ')
  const lines = safety.map((f) => `- ${f.map} map, ${f.pedalPct} % pedal at ${f.speedKmh} km/h: ${f.what}`).join('\n')
  return (id) => ({
    to,
    subject: `Safety concern: ${set.programName} · set ${set.number}${onMaps ? ` (${onMaps})` : ''}`,
    text: `${driver.name} flagged a safety concern on ${input.drivenOn} (${surfaceLabel(input.surface).toLowerCase()}, ${loadCaseLabel(input.loadCase).toLowerCase()}) driving set ${set.number} of ${set.programName}:\n${lines}\n\nOpen: ${appUrl(`/reports/${id}`)}\n`,
  })
}

export { nudgeMail }

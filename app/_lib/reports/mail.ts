import 'server-only'
import { emailsOfRole, type OutgoingMail } from '@/db/queries/mail'
import { SAFETY_SEVERITY } from '@/domain/report-safety'
import { engineersOfMap } from '@/db/queries/reports'
import { getRevisionWithMap } from '@/db/queries/maps'
import type { ReportInput } from '@/app/_schemas/report'
import { appUrl, nudgeMail } from '../mail/sender'
import type { SessionUser } from '../auth/session'

/** The e-mail for a new safety concern: to the lead engineers and the map's engineers. */
export async function safetyMailFor(input: ReportInput, driver: SessionUser): Promise<(id: number) => OutgoingMail> {
  const target = await getRevisionWithMap(input.revisionId)
  const map = target?.map ?? null
  const rev = target?.revision ?? null
  const to = [...new Set([...(await emailsOfRole('lead_engineer')), ...(map ? await engineersOfMap(map.id) : [])])]
  const flags = input.flags.filter((f) => f.severity === SAFETY_SEVERITY).map((f) => `- ${f.pedalPct} % pedal at ${f.speedKmh} km/h: ${f.what}`).join('\n')
  return (id) => ({
    to,
    subject: `Safety concern: ${map?.programName ?? ''} · ${map?.name ?? ''} r${rev?.number ?? '?'}`,
    text: `${driver.name} flagged a safety concern on ${input.drivenOn} (${input.surface}, ${input.loadCase}):\n${flags}\n\nOpen: ${appUrl(`/reports/${id}`)}\n`,
  })
}

export { nudgeMail }

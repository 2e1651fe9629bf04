import 'server-only'
import type { WaitingItem } from '@/app/_components/waiting-list'
import { revisionsInState, sentBackTo } from '@/db/queries/review'
import { listReports } from '@/db/queries/reports'
import { setsAwaitingDrive, unreadReportsOf } from '@/db/queries/tasks'
import { limitsFromVehicle, validate } from '@/maps'
import { listLatestRevisions } from '@/db/queries/maps'
import type { SessionUser } from '../auth/session'

export interface WaitingBox {
  title: string
  items: WaitingItem[]
  empty: string
  testId: string
}

const rev = (r: { id: number; programName: string; mapName: string; number: number }, detail?: string): WaitingItem => ({
  href: `/review/${r.id}`,
  label: `${r.programName} · ${r.mapName} r${r.number}`,
  detail,
})

/** What waits on the signed-in person, by role. */
export async function waitingFor(user: SessionUser): Promise<WaitingBox[]> {
  switch (user.role) {
    case 'lead_engineer': {
      const [queue, approved, safety] = await Promise.all([revisionsInState('in_review'), revisionsInState('approved'), listReports({ openSafety: true })])
      return [
        { title: 'Revisions to review', items: queue.filter((r) => r.authorId !== user.id).map((r) => rev(r, `“${r.message}” by ${r.authorName}`)), empty: 'Nothing waits for your review.', testId: 'waiting-review' },
        { title: 'Approved, ready to release', items: approved.map((r) => rev(r)), empty: 'No approved revision waits.', testId: 'waiting-release' },
        { title: 'Open safety concerns', items: safety.map((r) => ({ href: `/reports/${r.id}`, label: `${r.programName} · set ${r.setNumber}, ${r.drivenOn}`, detail: r.driverName })), empty: 'No open safety concern.', testId: 'waiting-safety' },
      ]
    }
    case 'calibration_engineer': {
      const returned = await sentBackTo(user.id)
      return [
        { title: 'Sent back to you', items: returned.map((r) => ({ ...rev(r, r.sentBackBy ? `sent back by ${r.sentBackBy}` : undefined), note: r.comment ?? undefined })), empty: 'Nothing was sent back.', testId: 'waiting-returned' },
        { title: 'Latest revisions with findings to clear', items: await findingsToClear(), empty: 'No latest revision has an error.', testId: 'waiting-findings' },
      ]
    }
    case 'test_driver': {
      const [toDrive, drafts] = await Promise.all([setsAwaitingDrive(), unreadReportsOf(user.id)])
      return [
        { title: 'Sets under test', items: toDrive.map((s) => ({ href: `/sets/${s.id}`, label: `${s.programName} · Set ${s.number}`, detail: s.note || undefined })), empty: 'No set is under test.', testId: 'waiting-drive' },
        { title: 'Your reports not yet read by a lead', items: drafts.map((r) => ({ href: `/reports/${r.id}`, label: `${r.programName} · set ${r.setNumber}, ${r.drivenOn}` })), empty: 'All your reports have been read.', testId: 'waiting-own-reports' },
      ]
    }
    default:
      return []
  }
}

async function findingsToClear(): Promise<WaitingItem[]> {
  const out: WaitingItem[] = []
  for (const m of await listLatestRevisions()) {
    const errors = validate(m.table, limitsFromVehicle(m.programParams)).filter((f) => f.severity === 'error').length
    if (errors > 0) out.push({ href: `/maps/${m.mapId}/edit`, label: `${m.programName} · ${m.mapName} r${m.number}`, detail: `${errors} error(s)` })
  }
  return out
}

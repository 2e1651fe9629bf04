import Link from 'next/link'
import { requirePageUser } from '../_lib/auth/page-access'
import { roleLabel } from '@/domain/roles'
import { SafetyCaution } from '../_components/safety-caution'
import { navFor } from '../_components/nav-items'
import { WaitingList } from '../_components/waiting-list'
import { waitingFor } from '../_lib/review/waiting'
import { setsAwaitingDrive } from '@/db/queries/tasks'
import { SetsToDrive } from './sets/sets-to-drive'
import type { Role } from '@/domain/roles'

const ROLE_TASKS: Record<Role, string> = {
  calibration_engineer: 'Shape drive and regen maps, check them against the traction physics, and save revisions with a reason.',
  test_driver: 'Drive an exact map set and file what you felt and logged against it.',
  lead_engineer: 'Compare revisions, weigh the drive reports, and release the map set that goes into the trucks.',
  admin: 'Manage the team’s accounts and roles.',
}

export default async function OverviewPage() {
  const user = await requirePageUser()
  const [boxes, toDrive] = await Promise.all([waitingFor(user), user.role === 'test_driver' ? setsAwaitingDrive() : null])
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-bold">Welcome, {user.name}</h1>
        <p className="text-slate-600">
          Signed in as {roleLabel(user.role)}. {ROLE_TASKS[user.role]}
        </p>
      </div>
      {(boxes.length > 0 || toDrive) && (
        <div className="grid gap-3 md:grid-cols-2 lg:grid-cols-3">
          {/* Drives are on sets: this box replaces any per-revision one. */}
          {toDrive && <SetsToDrive sets={toDrive} />}
          {boxes
            .filter((b) => !(toDrive && b.testId === 'waiting-drive'))
            .map((b) => (
              <WaitingList key={b.testId} {...b} />
            ))}
        </div>
      )}
      <div className="grid gap-3 sm:grid-cols-3">
        {navFor(user.role)
          .filter((i) => i.href !== '/')
          .map((i) => (
            <Link key={i.href} href={i.href} className="card hover:border-accent">
              <span className="font-semibold">{i.label}</span>
            </Link>
          ))}
      </div>
      <SafetyCaution />
    </div>
  )
}

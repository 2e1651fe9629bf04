import Link from 'next/link'
import { RampTable } from '@/app/_components/ramp-table'
import { formatTime, shortChecksum } from '@/app/_components/format'
import type { MapSetFull, SetPart } from '@/db/queries/sets'
import { STATE_LABELS } from '@/domain/revision-states'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'
import { DEFAULT_DESIGN_LATERAL_ACCEL_MPS2 } from '@/physics/lateral-margin'

function PartCard({ kind, part }: { kind: 'drive' | 'regen'; part: SetPart | null }) {
  const title = kind === 'drive' ? 'Drive map (accelerator)' : 'Regen map (brake pedal)'
  return (
    <div className="card min-w-0" data-testid={`set-part-${kind}`}>
      <h3 className="mb-2 font-semibold">{title}</h3>
      {!part ? (
        <p className="text-sm text-danger">This set holds no {kind} map.</p>
      ) : (
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
          <dt className="text-slate-600">Map</dt>
          <dd className="min-w-0 break-words">
            <Link href={`/maps/${part.mapId}/revisions/${part.number}`} className="font-medium text-accent hover:underline">
              {part.mapName} r{part.number}
            </Link>
          </dd>
          <dt className="text-slate-600">State</dt>
          <dd>{STATE_LABELS[part.state]}</dd>
          <dt className="text-slate-600">Checksum</dt>
          <dd className="font-mono" title={part.checksum}>{shortChecksum(part.checksum)}</dd>
          <dt className="text-slate-600">Author</dt>
          <dd>{part.authorName}</dd>
          <dt className="text-slate-600">Message</dt>
          <dd className="min-w-0 break-words">“{part.message}”</dd>
        </dl>
      )}
    </div>
  )
}

/** The parts of the set: the two map revisions, the parameter version they are judged with, and the ramp limits. */
export function SetParts({ set }: { set: MapSetFull }) {
  const pv = set.paramVersion
  const c = pv.releaseConditions
  return (
    <section aria-labelledby="parts-heading" className="space-y-3">
      <h2 id="parts-heading" className="text-lg font-semibold">What this set holds</h2>
      <div className="grid gap-3 md:grid-cols-3">
        <PartCard kind="drive" part={set.drive} />
        <PartCard kind="regen" part={set.regen} />
        <div className="card min-w-0" data-testid="set-param-version">
          <h3 className="mb-2 font-semibold">Parameter version v{pv.number}</h3>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
            <dt className="text-slate-600">Reason</dt>
            <dd className="min-w-0 break-words">{pv.reason}</dd>
            <dt className="text-slate-600">Made</dt>
            <dd>{formatTime(pv.createdAt)}</dd>
            <dt className="text-slate-600">Release checks</dt>
            <dd className="min-w-0">
              {c.surfaces.map(surfaceLabel).join(', ')}; {c.loadCases.map(loadCaseLabel).join(', ')}; margin {c.marginPct} %; design lateral acceleration{' '}
              {c.designLateralAccelMps2 ?? `${DEFAULT_DESIGN_LATERAL_ACCEL_MPS2} (default)`} m/s²
            </dd>
          </dl>
          <p className="mt-2 text-sm">
            <Link href={`/programs/${set.programId}`} className="text-accent hover:underline">{set.programName}: vehicle program</Link>
          </p>
        </div>
        <div className="card min-w-0 md:col-span-3" data-testid="set-ramps">
          {set.rampVersion ? (
            <>
              <h3 className="mb-2 font-semibold">Torque ramp limits v{set.rampVersion.number}</h3>
              <p className="mb-2 break-words text-sm">“{set.rampVersion.reason}” · {formatTime(set.rampVersion.createdAt)}</p>
              <RampTable limits={set.rampVersion.limits} />
            </>
          ) : (
            <p className="text-sm">
              <span className="font-semibold">No torque ramp limits in this set:</span> the controller keeps the ramps it has, so they are not part of what
              was driven and judged here. <Link href={`/programs/${set.programId}/ramps`} className="text-accent underline">The program’s ramp limits</Link>
            </p>
          )}
        </div>
      </div>
    </section>
  )
}

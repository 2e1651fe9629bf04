'use client'
import Link from 'next/link'
import { shortChecksum } from '@/app/_components/format'
import type { SetChoice } from '@/db/queries/reports'

export type { SetChoice }

/** "Set 3 — Site drive r2 · Site regen r1 · parameters v1" */
export function setLabel(s: SetChoice): string {
  const parts = [s.drive && `${s.drive.mapName} r${s.drive.number}`, s.regen && `${s.regen.mapName} r${s.regen.number}`].filter(Boolean)
  return `Set ${s.number} — ${parts.join(' · ')} · parameters v${s.paramVersion}${s.released ? ' (released)' : ''}`
}

/** What the chosen set holds, with the checksums to compare with what the vehicle reports. */
export function SetSummary({ set, fixed }: { set: SetChoice; fixed?: boolean }) {
  return (
    <div className="space-y-1 rounded bg-slate-100 px-2 py-1 text-xs" data-testid="set-summary">
      <p className="text-sm">
        <Link href={`/sets/${set.id}`} className="font-semibold text-accent hover:underline">{set.programName} · set {set.number}</Link>
        {fixed && <span className="text-slate-600"> — fixed when the report was filed; if it is wrong, ask a lead engineer to correct it.</span>}
      </p>
      {(['drive', 'regen'] as const).map((k) => {
        const p = set[k]
        return (
          <p key={k} className="break-words">
            <span className="text-slate-600">{k === 'drive' ? 'Drive map' : 'Regen map'}:</span>{' '}
            {p ? (
              <>
                {p.mapName} r{p.number} · checksum <span className="font-mono">{shortChecksum(p.checksum)}…</span>
              </>
            ) : (
              <span>none in this set</span>
            )}
          </p>
        )
      })}
      <p><span className="text-slate-600">Parameters:</span> version {set.paramVersion}</p>
      {!fixed && <p className="text-slate-600">Check the checksums match the ones the vehicle reports: if they differ, you are not driving this set.</p>}
    </div>
  )
}

/** Choose the program, then the set the vehicle was flashed with (its drive and regen revisions and parameter version). */
export function SetPicker(props: {
  sets: SetChoice[]
  programId: number | undefined
  setId: number | undefined
  onProgram: (id: number) => void
  onSet: (id: number) => void
  error?: string
}) {
  const programs = [...new Map(props.sets.map((s) => [s.programId, s.programName])).entries()].sort((a, b) => a[1].localeCompare(b[1]))
  const ofProgram = props.sets.filter((s) => s.programId === props.programId).sort((a, b) => b.number - a.number)
  const chosen = props.sets.find((s) => s.id === props.setId)
  if (props.sets.length === 0) return <p className="text-sm text-slate-600">No map set exists yet: an engineer makes one from a drive map revision, a regen map revision and a parameter version.</p>
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <div>
        <label htmlFor="program" className="label">Vehicle program</label>
        <select id="program" className="field" value={props.programId ?? ''} onChange={(e) => props.onProgram(Number(e.target.value))}>
          <option value="" disabled>Choose…</option>
          {programs.map(([id, name]) => (
            <option key={id} value={id}>{name}</option>
          ))}
        </select>
      </div>
      <div className="min-w-0">
        <label htmlFor="set" className="label">Set flashed</label>
        <select id="set" className="field" value={props.setId && Number.isFinite(props.setId) ? props.setId : ''} onChange={(e) => props.onSet(Number(e.target.value))} disabled={!props.programId}>
          <option value="" disabled>Choose…</option>
          {ofProgram.map((s) => (
            <option key={s.id} value={s.id}>{setLabel(s)}</option>
          ))}
        </select>
        {props.error && <p className="error-text">{props.error}</p>}
      </div>
      {chosen && (
        <div className="sm:col-span-2">
          <SetSummary set={chosen} />
        </div>
      )}
    </div>
  )
}

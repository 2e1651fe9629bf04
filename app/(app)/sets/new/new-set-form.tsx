'use client'
import Link from 'next/link'
import { useRouter } from 'next/navigation'
import { useMutation } from '@tanstack/react-query'
import { useState, type FormEvent } from 'react'
import { api } from '@/app/_components/api-client'

export interface RevisionChoice {
  id: number
  number: number
  /** The state's label, as shown. */
  state: string
  message: string
  at: string
}

export interface ProgramChoice {
  id: number
  name: string
  /** Newest first. */
  versions: { number: number; reason: string; at: string }[]
  /** Torque ramp versions, newest first (may be none). */
  ramps: { number: number; reason: string; at: string }[]
  maps: { id: number; name: string; kind: 'drive' | 'regen'; revisions: RevisionChoice[] }[]
}

interface Created {
  set: { id: number; number: number; programName: string }
  existing: boolean
}

const has = (p: ProgramChoice | undefined, kind: 'drive' | 'regen', id: number | undefined) => !!p?.maps.some((m) => m.kind === kind && m.revisions.some((r) => r.id === id))

/** Program first, then the two revisions and the parameter version of that program. */
export function NewSetForm({ programs, initial }: { programs: ProgramChoice[]; initial: { programId?: number; driveRevisionId?: number; regenRevisionId?: number } }) {
  const router = useRouter()
  const [programId, setProgramId] = useState<number | undefined>(programs.some((p) => p.id === initial.programId) ? initial.programId : programs[0]?.id)
  const program = programs.find((p) => p.id === programId)
  const [drive, setDrive] = useState(has(program, 'drive', initial.driveRevisionId) ? String(initial.driveRevisionId) : '')
  const [regen, setRegen] = useState(has(program, 'regen', initial.regenRevisionId) ? String(initial.regenRevisionId) : '')
  const [version, setVersion] = useState(program?.versions[0] ? String(program.versions[0].number) : '')
  const [ramps, setRamps] = useState(program?.ramps[0] ? String(program.ramps[0].number) : 'none')
  const [note, setNote] = useState('')
  const [error, setError] = useState<string | null>(null)
  const [existing, setExisting] = useState<Created['set'] | null>(null)

  const create = useMutation({
    mutationFn: (body: unknown) => api<Created>('/api/sets', { method: 'POST', json: body }),
    onSuccess: (res) => {
      setError(null)
      if (res.existing) setExisting(res.set)
      else router.push(`/sets/${res.set.id}`)
    },
    onError: (e) => setError(e.message),
  })

  function chooseProgram(id: number) {
    const p = programs.find((x) => x.id === id)
    setProgramId(id)
    setDrive('')
    setRegen('')
    setVersion(p?.versions[0] ? String(p.versions[0].number) : '')
    setRamps(p?.ramps[0] ? String(p.ramps[0].number) : 'none')
    setExisting(null)
  }

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault()
    setExisting(null)
    if (!drive || !regen) return setError('Choose a drive revision and a regen revision')
    create.mutate({ driveRevisionId: Number(drive), regenRevisionId: Number(regen), ...(version ? { paramVersion: Number(version) } : {}), rampVersion: ramps === 'none' ? null : Number(ramps), note })
  }

  if (programs.length === 0) return <p>Create a vehicle program and its maps first.</p>
  /** Any change of parts makes the earlier "already exists" answer stale. */
  const setChoice = (set: (v: string) => void, v: string) => {
    set(v)
    setExisting(null)
  }

  const mapsOf = (kind: 'drive' | 'regen') => program?.maps.filter((m) => m.kind === kind) ?? []
  const revisionSelect = (kind: 'drive' | 'regen', value: string, set: (v: string) => void) => {
    const maps = mapsOf(kind)
    const id = `${kind}-revision`
    return (
      <div>
        <label htmlFor={id} className="label">{kind === 'drive' ? 'Drive map revision' : 'Regen map revision'}</label>
        {maps.length === 0 ? (
          <p id={id} className="text-sm text-danger">
            {program?.name} has no {kind} map yet. <Link href="/maps/new" className="text-accent hover:underline">Make one</Link>
          </p>
        ) : (
          <select id={id} name={id} required className="field" value={value} onChange={(e) => setChoice(set, e.target.value)}>
            <option value="">Choose a {kind} revision…</option>
            {maps.map((m) => (
              <optgroup key={m.id} label={m.name}>
                {m.revisions.map((r) => (
                  <option key={r.id} value={r.id}>
                    {m.name} r{r.number} — {r.state} — “{r.message}”, {r.at}
                  </option>
                ))}
              </optgroup>
            ))}
          </select>
        )}
      </div>
    )
  }
  return (
    <form onSubmit={onSubmit} className="card space-y-4" aria-describedby={error ? 'new-set-error' : undefined}>
      <div>
        <label htmlFor="programId" className="label">Vehicle program</label>
        <select id="programId" name="programId" className="field" value={programId ?? ''} onChange={(e) => chooseProgram(Number(e.target.value))}>
          {programs.map((p) => (
            <option key={p.id} value={p.id}>{p.name}</option>
          ))}
        </select>
      </div>
      {revisionSelect('drive', drive, setDrive)}
      {revisionSelect('regen', regen, setRegen)}
      <div>
        <label htmlFor="paramVersion" className="label">Parameter version</label>
        {program && program.versions.length > 0 ? (
          <select id="paramVersion" name="paramVersion" className="field" value={version} onChange={(e) => setChoice(setVersion, e.target.value)} aria-describedby="paramVersion-hint">
            {program.versions.map((v, i) => (
              <option key={v.number} value={v.number}>
                v{v.number}{i === 0 ? ' (latest)' : ''} — {v.reason}, {v.at}
              </option>
            ))}
          </select>
        ) : (
          <p id="paramVersion" className="text-sm text-danger">{program?.name} has no parameter version.</p>
        )}
        <p id="paramVersion-hint" className="mt-1 text-xs text-slate-600">The vehicle parameters and release conditions both maps are judged with. The latest is the usual choice.</p>
      </div>
      <div>
        <label htmlFor="rampVersion" className="label">Torque ramp limits</label>
        <select id="rampVersion" name="rampVersion" className="field" value={ramps} onChange={(e) => setChoice(setRamps, e.target.value)} aria-describedby="rampVersion-hint">
          {program?.ramps.map((v, i) => (
            <option key={v.number} value={v.number}>
              ramps v{v.number}{i === 0 ? ' (latest)' : ''} — {v.reason}, {v.at}
            </option>
          ))}
          <option value="none">None: the controller keeps the ramps it has</option>
        </select>
        <p id="rampVersion-hint" className="mt-1 text-xs text-slate-600">
          How fast torque may rise and fall.{' '}
          {program && <Link href={`/programs/${program.id}/ramps`} className="text-accent underline">Edit the program’s ramp limits</Link>}
        </p>
      </div>
      <div>
        <label htmlFor="note" className="label">Note (optional)</label>
        <textarea id="note" name="note" rows={3} maxLength={2000} className="field" value={note} onChange={(e) => setNote(e.target.value)} placeholder="What this set is for, e.g. the winter test week" />
      </div>
      {error && <p id="new-set-error" role="alert" className="error-text text-sm">{error}</p>}
      {existing && (
        <p role="status" className="rounded border border-accent bg-accent-soft px-3 py-2 text-sm" data-testid="set-exists">
          These parts already make up {existing.programName} · Set {existing.number}; no new set was made.{' '}
          <Link href={`/sets/${existing.id}`} className="font-semibold text-accent underline">Open Set {existing.number}</Link>
        </p>
      )}
      <button type="submit" className="btn-primary" disabled={create.isPending || !program}>
        {create.isPending ? 'Making the set…' : 'Make the set'}
      </button>
    </form>
  )
}

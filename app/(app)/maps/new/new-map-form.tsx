'use client'
import { useRouter } from 'next/navigation'
import { useMutation } from '@tanstack/react-query'
import { useState, type FormEvent } from 'react'
import { api } from '@/app/_components/api-client'
import { limitsFromVehicle, starterTable, type MapKind } from '@/maps'
import type { VehicleParams } from '@/physics/vehicle'

interface ProgramOption {
  id: number
  name: string
  params: VehicleParams
}

export function NewMapForm({ programs }: { programs: ProgramOption[] }) {
  const router = useRouter()
  const [error, setError] = useState<string | null>(null)
  const create = useMutation({
    mutationFn: (body: unknown) => api<{ mapId: number }>('/api/maps', { method: 'POST', json: body }),
    onSuccess: ({ mapId }) => router.push(`/maps/${mapId}/edit`),
    onError: (e) => setError(e.message),
  })

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault()
    const f = new FormData(e.currentTarget)
    const program = programs.find((p) => p.id === Number(f.get('programId')))
    if (!program) return setError('Choose a vehicle program')
    const kind = f.get('kind') as MapKind
    create.mutate({
      programId: program.id,
      name: String(f.get('name') ?? ''),
      kind,
      description: String(f.get('description') ?? ''),
      message: kind === 'drive' ? 'Starting point: linear in pedal up to the motor envelope' : 'Starting point: no regen',
      table: starterTable(kind, limitsFromVehicle(program.params)),
    })
  }

  if (programs.length === 0) return <p>Create a vehicle program first.</p>
  return (
    <form onSubmit={onSubmit} className="card space-y-4">
      <div>
        <label htmlFor="programId" className="label">Vehicle program</label>
        <select id="programId" name="programId" className="field">
          {programs.map((p) => (
            <option key={p.id} value={p.id}>{p.name}</option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="name" className="label">Name</label>
        <input id="name" name="name" required maxLength={120} className="field" />
      </div>
      <div>
        <label htmlFor="kind" className="label">Kind</label>
        <select id="kind" name="kind" className="field">
          <option value="drive">Drive: accelerator pedal × speed → torque request</option>
          <option value="regen">Regen: brake pedal × speed → regen torque (0 % row = lift-off)</option>
        </select>
      </div>
      <div>
        <label htmlFor="description" className="label">Description</label>
        <textarea id="description" name="description" rows={2} className="field" />
      </div>
      {error && <p role="alert" className="error-text text-sm">{error}</p>}
      <button type="submit" className="btn-primary" disabled={create.isPending}>Create map</button>
      <p className="text-xs text-slate-500">
        The first revision is a starting shape computed from the program’s motor envelope; edit it in the grid.
      </p>
    </form>
  )
}

'use client'
import Link from 'next/link'
import { useQuery } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import type { ProgramRow } from '@/db/queries/programs'

type ProgramJson = Omit<ProgramRow, 'createdAt' | 'updatedAt'> & { updatedAt: string }

export function ProgramList({ canEdit }: { canEdit: boolean }) {
  const q = useQuery({ queryKey: ['programs'], queryFn: () => api<{ programs: ProgramJson[] }>('/api/programs') })
  return (
    <div className="space-y-4">
      <div className="flex items-center gap-3">
        <h1 className="text-2xl font-bold">Vehicle programs</h1>
        {canEdit && (
          <Link href="/programs/new" className="btn-primary ml-auto">
            New program
          </Link>
        )}
      </div>
      {q.isPending && <p>Loading…</p>}
      {q.error && <p role="alert" className="error-text">{q.error.message}</p>}
      {q.data && q.data.programs.length === 0 && <p className="text-slate-600">No vehicle programs yet.</p>}
      <ul className="grid gap-3 md:grid-cols-2">
        {q.data?.programs.map((p) => (
          <li key={p.id} className="card">
            <Link href={`/programs/${p.id}`} className="text-lg font-semibold text-accent hover:underline">
              {p.name}
            </Link>
            <p className="text-sm text-slate-600">{p.description}</p>
            <p className="mt-2 text-xs text-slate-500">
              {p.params.axleLayout} · {(p.params.emptyMassKg / 1000).toFixed(1)}–{(p.params.grossMassKg / 1000).toFixed(1)} t ·{' '}
              {(p.params.motorPeakPowerW / 1000).toFixed(0)} kW / {p.params.motorPeakTorqueNm} N·m
              {p.params.trailer ? ' · with semitrailer' : ''}
            </p>
          </li>
        ))}
      </ul>
    </div>
  )
}

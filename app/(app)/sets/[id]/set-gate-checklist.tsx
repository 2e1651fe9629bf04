import Link from 'next/link'
import type { SetGateCondition, SetGateResult } from '@/app/_lib/sets/gate'

/** Each release condition of the set as met or not, with its evidence and where to look. */
export function SetGateChecklist({ gate, programId }: { gate: SetGateResult; programId: number }) {
  const links: Partial<Record<SetGateCondition['id'], { href: string; label: string }>> = {
    validation: { href: '#findings', label: 'findings above' },
    traction: { href: `/programs/${programId}/physics`, label: 'traction limits of the program' },
    jackknife: { href: `/programs/${programId}/physics`, label: 'traction limits of the program' },
    'lift-off': { href: `/programs/${programId}/physics`, label: 'lift-off at the battery corners' },
    'drive-report': { href: '#reports', label: 'drive reports below' },
    coverage: { href: '#coverage', label: 'coverage grid below' },
    safety: { href: '#reports', label: 'drive reports below' },
  }
  return (
    <section className="card" aria-labelledby="gate-heading" data-testid="set-gate">
      <h3 id="gate-heading" className="mb-2 font-semibold">Release conditions {gate.ok ? '— all met' : '— not all met'}</h3>
      <ul className="space-y-2 text-sm">
        {gate.conditions.map((c) => {
          const link = links[c.id]
          return (
            <li key={c.id} data-testid={`set-gate-${c.id}`} data-met={c.met} className="flex gap-2">
              <span className={`inline-block h-fit w-16 shrink-0 rounded px-1 text-center text-xs font-semibold ${c.met ? 'bg-accent-soft text-accent' : 'bg-red-100 text-danger'}`}>{c.met ? 'met' : 'not met'}</span>
              <div className="min-w-0 break-words">
                {c.summary}
                {link && (
                  <>
                    {' '}· <Link href={link.href} className="text-accent underline">{link.label}</Link>
                  </>
                )}
                {c.details.length > 0 && (
                  <ul className="mt-1 ml-4 list-disc text-xs text-slate-600">
                    {c.details.map((d, i) => <li key={i}>{d}</li>)}
                  </ul>
                )}
              </div>
            </li>
          )
        })}
      </ul>
      {gate.exceptions.length > 0 && (
        <p className="mt-2 text-xs text-slate-600">Traction and jackknife exceptions stay open here until a lead engineer gives a reason for each one when releasing.</p>
      )}
      {gate.uncovered.length > 0 && (
        <p className="mt-2 text-xs text-slate-600">Release conditions without a drive report stay open here until a report covers them or a lead engineer waives each one, with a reason, when releasing.</p>
      )}
    </section>
  )
}

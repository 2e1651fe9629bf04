import Link from 'next/link'
import type { GateResult } from '@/app/_lib/review/gate'

/** Each release condition as met or not, with where to look. */
export function GateChecklist(props: { gate: GateResult; findingsCount: number; mapId: number; number: number; programId: number }) {
  const links: Record<string, { href: string; label: string }> = {
    validation: { href: `/maps/${props.mapId}/revisions/${props.number}`, label: `${props.findingsCount} finding(s) on the map` },
    traction: { href: `/programs/${props.programId}/physics`, label: 'traction limits of the program' },
    'drive-report': { href: '#reports', label: 'drive reports below' },
  }
  return (
    <section className="card" aria-label="Release conditions">
      <h2 className="mb-2 font-semibold">Release conditions {props.gate.ok ? '— all met' : '— not all met'}</h2>
      <ul className="space-y-2 text-sm">
        {props.gate.conditions.map((c) => (
          <li key={c.id} data-testid={`gate-${c.id}`} data-met={c.met}>
            <span className={`mr-2 inline-block w-14 rounded px-1 text-center text-xs font-semibold ${c.met ? 'bg-accent-soft text-accent' : 'bg-red-100 text-danger'}`}>{c.met ? 'met' : 'not met'}</span>
            {c.summary} · <Link href={links[c.id].href} className="text-accent hover:underline">{links[c.id].label}</Link>
            {c.details.length > 0 && (
              <ul className="ml-16 list-disc text-xs text-slate-600">
                {c.details.slice(0, 8).map((d, i) => <li key={i}>{d}</li>)}
              </ul>
            )}
          </li>
        ))}
      </ul>
    </section>
  )
}

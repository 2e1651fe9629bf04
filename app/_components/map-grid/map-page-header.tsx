/** The heading of the editor and revision pages: which map, of which program, at which revision. */
import Link from 'next/link'
import type { ReactNode } from 'react'

export interface MapPageHeaderProps {
  map: { id: number; name: string; kind: 'drive' | 'regen'; programName: string }
  revision: { number: number; checksum: string }
  title: string
  actions?: ReactNode
}

export function MapPageHeader({ map, revision, title, actions }: MapPageHeaderProps) {
  return (
    <div className="flex flex-wrap items-start gap-3">
      <div className="space-y-0.5">
        <p className="text-sm text-slate-500">
          <Link href="/maps" className="hover:underline">Maps</Link> · {map.programName} ·{' '}
          <Link href={`/maps/${map.id}`} className="hover:underline">{map.name}</Link>
        </p>
        <h1 className="text-2xl font-bold">
          {title}: {map.name}
        </h1>
        <p className="text-sm text-slate-600">
          {map.kind === 'drive' ? 'Drive map' : 'Regen map (0 % row is lift-off)'} · program {map.programName} · revision{' '}
          <span data-testid="base-revision">{revision.number}</span> · checksum{' '}
          <code className="text-xs" title={revision.checksum}>{revision.checksum.slice(0, 16)}…</code>
        </p>
      </div>
      {actions && <div className="ml-auto flex gap-2">{actions}</div>}
    </div>
  )
}

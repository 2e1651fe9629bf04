import { MarkdownNotes } from '@/app/_components/markdown-notes'
import type { ReleaseConditions } from '@/db/schema'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'
import type { VehicleParams } from '@/physics/vehicle'
import { TRAILER_FIELDS, VEHICLE_FIELDS, type NumberField } from '../program-fields'

/** A stored SI value in the unit the form shows (the form's own scale), without float noise. */
function shown(value: number | undefined, f: NumberField<string>): string {
  if (value === undefined) return '—'
  const v = value / (f.scale ?? 1)
  return `${Number(v.toPrecision(6)).toLocaleString('en-GB')}${f.unit && f.unit !== ':1' ? ` ${f.unit}` : f.unit}`
}

function Group({ title, rows }: { title: string; rows: [string, string][] }) {
  return (
    <section className="card">
      <h2 className="mb-2 font-semibold">{title}</h2>
      <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[max-content_1fr]">
        {rows.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-slate-600">{k}</dt>
            <dd className="font-medium">{v}</dd>
          </div>
        ))}
      </dl>
    </section>
  )
}

/**
 * The program for a role that may not change it: plain text in definition lists, with nothing
 * that looks like a field to type into (the form's disabled inputs read as "broken" to people).
 */
export function ProgramDetails(props: { name: string; description: string; params: VehicleParams; releaseConditions: ReleaseConditions | null }) {
  const p = props.params
  const num = p as unknown as Record<string, number | undefined>
  const rc = props.releaseConditions
  return (
    <div className="space-y-4" data-testid="program-details">
      <p className="text-sm text-slate-600">Only engineers change a vehicle program; here it is to read.</p>
      <section className="card space-y-2">
        <h2 className="font-semibold">{props.name}</h2>
        <p className="text-sm">Axle layout {p.axleLayout === '6x4' ? '6×4 (tandem drive)' : '4×2'}</p>
        <MarkdownNotes text={props.description} />
      </section>
      {VEHICLE_FIELDS.map((g) => (
        <Group
          key={g.group}
          title={g.group}
          rows={[
            ...g.fields.map((f): [string, string] => [f.label, shown(num[f.key], f)]),
            ...(g.group === 'Driveline and motor' ? [['Gear ratios', p.gearRatios.map((r) => `${r}:1`).join(', ')] as [string, string]] : []),
          ]}
        />
      ))}
      {p.trailer ? (
        <Group title="Semitrailer" rows={TRAILER_FIELDS.map((f): [string, string] => [f.label, shown((p.trailer as unknown as Record<string, number>)[f.key], f)])} />
      ) : (
        <section className="card text-sm">No semitrailer: a rigid truck or a tractor running solo.</section>
      )}
      {rc && (
        <Group
          title="Release conditions"
          rows={[
            ['Surfaces', rc.surfaces.map(surfaceLabel).join(', ')],
            ['Load cases', rc.loadCases.map(loadCaseLabel).join(', ')],
            ['Traction margin', `${rc.marginPct} % below the limit`],
          ]}
        />
      )}
    </div>
  )
}

import Link from 'next/link'
import { requirePageUser } from '@/app/_lib/auth/page-access'
import { pageId } from '@/app/_lib/http/page-params'
import { drivabilityQuerySchema, MANOEUVRE_LABELS, run, setDrivability, type DrivabilityQuery } from '@/app/_lib/sets/drivability'
import { loadSet } from '@/app/_lib/sets/service'
import { SafetyCaution } from '@/app/_components/safety-caution'
import { MANOEUVRES, type ManoeuvreKind } from '@/physics/drivability'
import { loadCaseLabel } from '@/physics/load-cases'
import { surfaceLabel } from '@/physics/surfaces'
import { DrivabilityPlots } from './drivability-plots'
import { GradeSection } from './grade-section'

export const metadata = { title: 'Drivability' }

const FIELDS: { key: keyof DrivabilityQuery; label: string; unit: string }[] = [
  { key: 'tipInSpeedKmh', label: 'Tip-in: held speed', unit: 'km/h' },
  { key: 'tipInFromPct', label: 'Tip-in: from pedal', unit: '%' },
  { key: 'tipInToPct', label: 'Tip-in: to pedal', unit: '%' },
  { key: 'tipOutSpeedKmh', label: 'Tip-out: speed', unit: 'km/h' },
  { key: 'tipOutFromPct', label: 'Tip-out: from pedal', unit: '%' },
  { key: 'launchPedalPct', label: 'Launch: pedal', unit: '%' },
]

const fmt = (x: number | null, d = 2) => (x === null ? '—' : x.toFixed(d))

/** /sets/:id/drivability — each manoeuvre on each release condition, pass or fail against the comfort limits, and one run's traces. */
export default async function DrivabilityPage(props: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser()
  const set = await loadSet(pageId((await props.params).id, 'Set id'))
  const raw = Object.fromEntries(Object.entries(await props.searchParams).filter(([, v]) => typeof v === 'string' && v !== '')) as Record<string, string>
  const parsed = drivabilityQuerySchema.safeParse(raw)
  const q = parsed.success ? parsed.data : drivabilityQuerySchema.parse({})
  const problems = parsed.success ? [] : parsed.error.issues.map((i) => i.message)
  if (!set.drive) return <p className="card">Set {set.number} holds no drive map: drivability needs one.</p>
  const result = setDrivability(set, q)
  const chosen = result.rows.find((r) => r.manoeuvre === raw.manoeuvre && r.surface === raw.surface && r.loadCase === raw.loadCase) ?? result.rows.find((r) => r.fails.length) ?? result.rows[0]
  const trace = chosen ? run(set, q, chosen.manoeuvre, chosen.surface, chosen.loadCase) : null
  const link = (m: ManoeuvreKind, surface: string, loadCase: string) => `?${new URLSearchParams({ ...Object.fromEntries(FIELDS.map((f) => [f.key, String(q[f.key])])), manoeuvre: m, surface, loadCase })}#traces`
  return (
    <div className="space-y-5">
      <div>
        <p className="text-sm text-slate-500">
          <Link href="/sets" className="hover:underline">Map sets</Link> · <Link href={`/sets/${set.id}`} className="hover:underline">{set.programName} · Set {set.number}</Link>
        </p>
        <h1 className="text-2xl font-bold">Drivability of set {set.number}</h1>
        <p className="max-w-3xl text-sm text-slate-600">
          Tip-in (a pedal step from a held speed), tip-out (pedal released into lift-off regen) and launch, through the set’s{' '}
          {result.ramps ? `torque ramp limits v${result.ramps.number}` : 'maps with no ramp limits (the request reaches the motor at once)'}, on every
          release condition of parameter version v{set.paramVersion.number}. The model assumes no traction control and a rigid driveline (docs/physics.md).
        </p>
        <p className="max-w-3xl text-sm text-slate-600" data-testid="map-speed-source">
          {result.mapSpeedSource === 'driven-wheel'
            ? 'The maps are looked up on the driven-wheel speed (from the motor speed): a spin raises the looked-up speed, so a map whose torque falls with speed asks for less and the spin partly limits itself.'
            : 'The maps are looked up on the road speed: a spinning wheel does not change the request, so on a low-friction launch nothing but the map and the ramps limits the torque and the slip can grow large while the truck barely moves.'}{' '}
          Neither is traction control; the program’s parameters say which speed the controller uses.
        </p>
      </div>
      <form method="get" className="card space-y-3" aria-labelledby="settings-heading">
        <h2 id="settings-heading" className="font-semibold">Manoeuvres</h2>
        <div className="grid gap-3 sm:grid-cols-3">
          {FIELDS.map((f) => (
            <div key={f.key}>
              <label htmlFor={f.key} className="label">{f.label} ({f.unit})</label>
              <input id={f.key} name={f.key} className="field tabular-nums" inputMode="decimal" defaultValue={String(raw[f.key] ?? q[f.key])} />
            </div>
          ))}
        </div>
        {problems.length > 0 && (
          <ul role="alert" className="list-disc pl-5 text-sm text-danger">{problems.map((p) => <li key={p}>{p} (the default is used)</li>)}</ul>
        )}
        <button type="submit" className="btn-primary">Run again</button>
      </form>
      <section className="space-y-2" aria-labelledby="results-heading">
        <h2 id="results-heading" className="text-lg font-semibold">
          Results: <span data-testid="drivability-verdict" className={result.passed ? 'text-accent' : 'text-danger'}>{result.passed ? 'every run within the comfort limits' : `${result.rows.filter((r) => r.fails.length).length} of ${result.rows.length} runs outside the comfort limits`}</span>
        </h2>
        <p className="text-sm">
          Comfort limits: peak jerk at most <strong>{result.comfort.maxPeakJerkMps3} m/s³</strong>, 90 % of the torque change within{' '}
          <strong>{result.comfort.maxTimeTo90S} s</strong>. Source: {result.comfort.source}.{' '}
          <Link href={`/programs/${set.programId}`} className="text-accent underline">Set them in the program’s release conditions</Link>
        </p>
        <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Drivability results">
          <table className="min-w-full text-sm" data-testid="drivability-table">
            <thead>
              <tr className="text-left">
                {['Manoeuvre', 'Surface', 'Load case', 'Peak jerk (m/s³)', 'RMS jerk (m/s³)', 'Time to 90 % (s)', 'Peak slip', 'Time beyond tyre peak (s)', 'Speed reached (km/h)', 'Verdict'].map((h) => (
                  <th key={h} scope="col" className="px-2 py-1">{h}</th>
                ))}
              </tr>
            </thead>
            <tbody>
              {result.rows.map((r) => (
                <tr key={`${r.manoeuvre}-${r.surface}-${r.loadCase}`} className="border-t border-line" data-testid={`row-${r.manoeuvre}-${r.surface}-${r.loadCase}`}>
                  <td className="px-2 py-1">
                    <Link href={link(r.manoeuvre, r.surface, r.loadCase)} className="text-accent underline">{MANOEUVRE_LABELS[r.manoeuvre]}</Link>
                  </td>
                  <td className="px-2 py-1">{surfaceLabel(r.surface)}</td>
                  <td className="px-2 py-1">{loadCaseLabel(r.loadCase)}</td>
                  <td className={`px-2 py-1 tabular-nums ${r.fails.includes('jerk') ? 'font-semibold text-danger' : ''}`}>{fmt(r.peakJerkMps3)}</td>
                  <td className="px-2 py-1 tabular-nums">{fmt(r.rmsJerkMps3)}</td>
                  <td className={`px-2 py-1 tabular-nums ${r.fails.includes('response') ? 'font-semibold text-danger' : ''}`}>{fmt(r.timeTo90PctS)}</td>
                  <td className="px-2 py-1 tabular-nums">{fmt(Math.max(r.peakSlip, -r.minSlip), 3)}</td>
                  <td className="px-2 py-1 tabular-nums">{fmt(r.timeBeyondPeakS)}</td>
                  <td className="px-2 py-1 tabular-nums">{fmt(r.speedReachedKmh, 1)}</td>
                  <td className="px-2 py-1">{r.fails.length ? `fails: ${r.fails.map((f) => (f === 'jerk' ? 'jerk' : 'response time')).join(', ')}` : 'passes'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
      {result.grade && <GradeSection checks={result.grade} programId={set.programId} />}
      {chosen && trace && (
        <section id="traces" className="space-y-2" aria-labelledby="traces-heading">
          <h2 id="traces-heading" className="text-lg font-semibold">Traces: {chosen.label}</h2>
          <p className="text-sm text-slate-600">The pedal moves at {trace.pedalAtS} s, after the wheel has settled under the held torque. Choose another run in the table above.</p>
          <DrivabilityPlots
            filename={`set-${set.number}-${chosen.manoeuvre}-${chosen.surface}-${chosen.loadCase}`}
            tyrePeakSlip={Number.isFinite(trace.summary.tyrePeakSlip) ? trace.summary.tyrePeakSlip : null}
            series={{
              t: trace.samples.map((s) => s.t),
              speedKmh: trace.samples.map((s) => s.speedKmh),
              wheelSpeedKmh: trace.samples.map((s) => s.wheelSpeedKmh),
              slip: trace.samples.map((s) => s.slip),
              motorTorqueNm: trace.samples.map((s) => s.motorTorqueNm),
              jerkMps3: trace.samples.map((s) => s.jerkMps3),
            }}
            jerkLimit={result.comfort.maxPeakJerkMps3}
          />
        </section>
      )}
      <p className="text-sm text-slate-600">Manoeuvres run: {MANOEUVRES.map((m) => MANOEUVRE_LABELS[m]).join(', ')}.</p>
      <SafetyCaution />
    </div>
  )
}

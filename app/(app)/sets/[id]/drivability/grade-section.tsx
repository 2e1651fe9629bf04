import Link from 'next/link'
import type { GradeCheck } from '@/physics/gradeability'
import { loadCaseLabel } from '@/physics/load-cases'

const VERDICT: Record<GradeCheck['verdict'], string> = {
  met: 'passes',
  'map-short': 'fails: the map asks too little',
  'envelope-short': 'fails: beyond the motor and battery',
  'traction-short': 'fails: beyond the tyres — no single map satisfies both',
}

const n0 = (x: number) => Math.round(x).toLocaleString('en-GB')

/** "Start and hold on grade": the version's declared requirements against the drive map at full pedal (physics/gradeability.ts). */
export function GradeSection({ checks, programId }: { checks: GradeCheck[]; programId: number }) {
  const passed = checks.every((k) => k.verdict === 'met')
  return (
    <section className="space-y-2" aria-labelledby="grade-heading" data-testid="grade-section">
      <h2 id="grade-heading" className="text-lg font-semibold">
        Start and hold on grade: <span data-testid="grade-verdict" className={passed ? 'text-accent' : 'text-danger'}>{passed ? 'every requirement met' : `${checks.filter((k) => k.verdict !== 'met').length} of ${checks.length} not met`}</span>
      </h2>
      <p className="max-w-3xl text-sm text-slate-600">
        Wheel force F = m·g·(sin θ + C_rr·cos θ) + ½ρC_dA·V² for the {checks[0] ? loadCaseLabel(checks[0].loadCase).toLowerCase() : 'laden'} truck, through the
        driveline to the motor, against the drive map at full pedal (capped by the motor and battery) and what the tyres carry on dry
        asphalt on that grade. The band is needed ≤ full-pedal torque ≤ tyre limit; a start needs a little more than this steady
        figure to move off. <Link href={`/programs/${programId}`} className="text-accent underline">Set the grades in the program’s release conditions</Link>
      </p>
      <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Start and hold on grade">
        <table className="min-w-full text-sm">
          <thead>
            <tr className="text-left">
              {['Requirement', 'Wheel force (N)', 'Needed (N·m)', 'Map at full pedal (N·m)', 'Motor and battery (N·m)', 'Tyres allow (N·m)', 'Verdict'].map((h) => (
                <th key={h} scope="col" className="px-2 py-1">{h}</th>
              ))}
            </tr>
          </thead>
          <tbody>
            {checks.map((k) => (
              <tr key={k.kind} className="border-t border-line align-top" data-testid={`grade-${k.kind}`}>
                <td className="px-2 py-1">{k.kind === 'start' ? `Start on ${k.gradePct} %` : `Hold ${k.speedKmh} km/h on ${k.gradePct} %`}</td>
                <td className="px-2 py-1 tabular-nums">{n0(k.wheelForceN)}</td>
                <td className="px-2 py-1 tabular-nums">{n0(k.neededNm)}</td>
                <td className={`px-2 py-1 tabular-nums ${k.verdict === 'map-short' ? 'font-semibold text-danger' : ''}`}>{n0(k.mapNm)}</td>
                <td className={`px-2 py-1 tabular-nums ${k.verdict === 'envelope-short' ? 'font-semibold text-danger' : ''}`}>{n0(k.envelopeNm)}</td>
                <td className={`px-2 py-1 tabular-nums ${k.verdict === 'traction-short' ? 'font-semibold text-danger' : ''}`}>{n0(k.tractionNm)}</td>
                <td className="px-2 py-1">{VERDICT[k.verdict]}<p className="text-xs text-slate-600">{k.explanation}</p></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  )
}

'use client'

import { useState } from 'react'
import { useRouter } from 'next/navigation'
import { api, ApiError } from '@/app/_components/api-client'
import { rampLimitsSchema, MAX_RAMP_BREAKPOINTS, type RampLimits } from '@/maps/ramps'

interface Row { speed: string; tipIn: string; tipOut: string }

const toRows = (r: RampLimits): Row[] => r.speedKmh.map((s, i) => ({ speed: String(s), tipIn: String(r.tipInNmPerS[i]), tipOut: String(r.tipOutNmPerS[i]) }))
const num = (s: string) => (s.trim() === '' ? NaN : Number(s))

/**
 * A new ramp version from the latest (or the starter ramps): rows of speed, tip-in and tip-out,
 * the lash band and its rate, and a reason. Checked with the server's own schema before sending,
 * so a mistake is named at its field at once; the server checks again.
 */
export function RampEditor(props: { programId: number; initial: RampLimits; fromVersion: number | null }) {
  const router = useRouter()
  const [rows, setRows] = useState<Row[]>(() => toRows(props.initial))
  const [band, setBand] = useState(String(props.initial.lashBandNm))
  const [lashRate, setLashRate] = useState(String(props.initial.lashRateNmPerS))
  const [reason, setReason] = useState('')
  const [errors, setErrors] = useState<string[]>([])
  const [busy, setBusy] = useState(false)

  const limits = () => ({ speedKmh: rows.map((r) => num(r.speed)), tipInNmPerS: rows.map((r) => num(r.tipIn)), tipOutNmPerS: rows.map((r) => num(r.tipOut)), lashBandNm: num(band), lashRateNmPerS: num(lashRate) })
  const where = (path: PropertyKey[]) => {
    const [field, i] = path
    const row = typeof i === 'number' ? ` (row ${i + 1})` : ''
    const names: Record<string, string> = { speedKmh: 'Road speed', tipInNmPerS: 'Tip-in', tipOutNmPerS: 'Tip-out', lashBandNm: 'Lash band', lashRateNmPerS: 'Lash-band rate' }
    return `${names[String(field)] ?? String(field)}${row}`
  }
  const set = (i: number, k: keyof Row, v: string) => setRows((rs) => rs.map((r, j) => (j === i ? { ...r, [k]: v } : r)))

  async function submit(e: React.FormEvent) {
    e.preventDefault()
    const parsed = rampLimitsSchema.safeParse(limits())
    const problems = parsed.success ? [] : parsed.error.issues.map((i) => `${where(i.path)}: ${i.message}`)
    if (!reason.trim()) problems.push('Reason: say why the ramp limits change')
    setErrors(problems)
    if (problems.length) return
    setBusy(true)
    try {
      const res = await api<{ version: { number: number } }>(`/api/programs/${props.programId}/ramp-versions`, { method: 'POST', json: { limits: parsed.data, reason } })
      router.push(`/programs/${props.programId}/ramps?saved=${res.version.number}`)
      router.refresh()
    } catch (err) {
      setErrors([err instanceof ApiError || err instanceof Error ? err.message : String(err)])
    } finally {
      setBusy(false)
    }
  }

  return (
    <form onSubmit={submit} className="card space-y-3" aria-labelledby="new-ramps" noValidate>
      <h2 id="new-ramps" className="font-semibold">New ramp version{props.fromVersion !== null ? ` (from version ${props.fromVersion})` : ' (starting from ramps scaled to the motor)'}</h2>
      <p className="text-sm text-slate-600">Speeds in km/h (one decimal at most), rates in whole N·m/s at the motor shaft. Rates between speeds are linear and held beyond the ends.</p>
      <div className="relative overflow-x-auto">
        <table className="text-sm">
          <thead>
            <tr className="text-left">
              <th scope="col" className="pr-2">Road speed (km/h)</th>
              <th scope="col" className="pr-2">Tip-in (N·m/s)</th>
              <th scope="col" className="pr-2">Tip-out (N·m/s)</th>
              <th scope="col"><span className="sr-only">Remove</span></th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => (
              <tr key={i}>
                {(['speed', 'tipIn', 'tipOut'] as const).map((k) => (
                  <td key={k} className="pr-2 py-0.5">
                    <input
                      className="field w-20 tabular-nums sm:w-28"
                      inputMode="decimal"
                      aria-label={`${k === 'speed' ? 'Road speed' : k === 'tipIn' ? 'Tip-in' : 'Tip-out'}, row ${i + 1}`}
                      value={r[k]}
                      onChange={(e) => set(i, k, e.target.value)}
                    />
                  </td>
                ))}
                <td>
                  <button type="button" className="btn" disabled={rows.length <= 2} onClick={() => setRows((rs) => rs.filter((_, j) => j !== i))} aria-label={`Remove row ${i + 1}`}>
                    Remove
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <button
        type="button"
        className="btn"
        disabled={rows.length >= MAX_RAMP_BREAKPOINTS}
        onClick={() => setRows((rs) => [...rs, { ...rs[rs.length - 1], speed: String(num(rs[rs.length - 1].speed) + 10) }])}
      >
        Add a speed breakpoint
      </button>
      <div className="flex flex-wrap gap-4">
        <div>
          <label htmlFor="lash-band" className="label">Lash band, ± N·m around zero torque</label>
          <input id="lash-band" className="field w-32 tabular-nums" inputMode="numeric" value={band} onChange={(e) => setBand(e.target.value)} />
        </div>
        <div>
          <label htmlFor="lash-rate" className="label">Rate through the lash band (N·m/s)</label>
          <input id="lash-rate" className="field w-32 tabular-nums" inputMode="numeric" value={lashRate} onChange={(e) => setLashRate(e.target.value)} />
        </div>
      </div>
      <div>
        <label htmlFor="ramp-reason" className="label">Reason for this change</label>
        <textarea id="ramp-reason" className="field" rows={2} value={reason} onChange={(e) => setReason(e.target.value)} />
      </div>
      {errors.length > 0 && (
        <ul role="alert" className="list-disc space-y-1 pl-5 text-sm text-danger" data-testid="ramp-errors">
          {errors.map((m) => <li key={m}>{m}</li>)}
        </ul>
      )}
      <button type="submit" className="btn-primary" disabled={busy}>{busy ? 'Saving…' : 'Save as a new ramp version'}</button>
    </form>
  )
}

/** Pedal traces for the time-domain simulations. Pedal in % (0–100), time in s. */
import { PhysicsInputError, requireFinite } from './errors'

/** A step to `pedalPct` at `atS` (default 0), a linear ramp, or logged samples (linear between samples, held at the ends). */
export type PedalTrace =
  | { kind: 'step'; pedalPct: number; atS?: number }
  | { kind: 'ramp'; fromPct?: number; toPct: number; startS?: number; durationS: number }
  | { kind: 'samples'; samples: { t: number; pedalPct: number }[] }

/** Throws PhysicsInputError for a malformed trace. @example checkPedalTrace({ kind: 'step', pedalPct: 100 }) */
export function checkPedalTrace(p: PedalTrace): void {
  if (p.kind === 'step') { requireFinite('pedal.pedalPct', p.pedalPct); requireFinite('pedal.atS', p.atS ?? 0); return }
  if (p.kind === 'ramp') {
    requireFinite('pedal.fromPct', p.fromPct ?? 0); requireFinite('pedal.toPct', p.toPct); requireFinite('pedal.startS', p.startS ?? 0)
    if (!(p.durationS >= 0 && Number.isFinite(p.durationS))) throw new PhysicsInputError('pedal.durationS', 'must be a finite number ≥ 0')
    return
  }
  if (p.kind !== 'samples' || !Array.isArray(p.samples) || p.samples.length === 0)
    throw new PhysicsInputError('pedal', 'must be a step, a ramp, or at least one {t, pedalPct} sample')
  p.samples.forEach((s, i) => {
    requireFinite(`pedal.samples[${i}].t`, s.t); requireFinite(`pedal.samples[${i}].pedalPct`, s.pedalPct)
    if (i > 0 && !(s.t > p.samples[i - 1].t)) throw new PhysicsInputError(`pedal.samples[${i}].t`, 'sample times must be strictly ascending')
  })
}

/**
 * Pedal % at time t (s).
 * @example pedalAt({ kind: 'ramp', toPct: 100, durationS: 2 }, 1) // 50
 */
export function pedalAt(p: PedalTrace, t: number): number {
  if (p.kind === 'step') return t >= (p.atS ?? 0) ? p.pedalPct : 0
  if (p.kind === 'ramp') {
    const from = p.fromPct ?? 0
    const s = t - (p.startS ?? 0)
    if (s <= 0) return from
    if (s >= p.durationS) return p.toPct
    return from + ((p.toPct - from) * s) / p.durationS
  }
  const xs = p.samples
  if (t <= xs[0].t) return xs[0].pedalPct
  const last = xs[xs.length - 1]
  if (t >= last.t) return last.pedalPct
  let lo = 0
  let hi = xs.length - 1
  while (hi - lo > 1) { const m = (lo + hi) >> 1; if (xs[m].t <= t) lo = m; else hi = m }
  const a = xs[lo]
  const b = xs[hi]
  return a.pedalPct + ((b.pedalPct - a.pedalPct) * (t - a.t)) / (b.t - a.t)
}

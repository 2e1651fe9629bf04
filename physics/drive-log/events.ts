/**
 * Wheel-spin and lock-up detection on the measured slip. A sample is flagged spin when κ > spinSlip and
 * lock when κ < −lockSlip; consecutive flagged samples of one kind form an event that runs from the first
 * flagged sample to the first sample back in band. A gap, an incomplete sample or the end of the log closes
 * an event at its last flagged sample. Events shorter than the minimum duration are counted, not kept.
 */
import type { EventPoint, SlipEvent } from './types'

/** Event detector state machine. */
export interface EventDetector {
  /** One complete sample: `state` is 'spin', 'lock' or null (in band / too slow to judge). */
  sample(state: 'spin' | 'lock' | null, p: EventPoint, line: number): void
  /** Ends any open event at its last flagged sample (before a gap, an incomplete sample, at the end). */
  interrupt(): void
  readonly events: SlipEvent[]
  readonly dropped: number
  readonly short: number
}

/** @example const d = createEventDetector(0.1, 100); d.sample('spin', p0, 2); d.sample(null, p1, 3) */
export function createEventDetector(minDurationS: number, maxEvents: number): EventDetector {
  const events: SlipEvent[] = []
  let dropped = 0
  let short = 0
  let open: { kind: 'spin' | 'lock'; start: EventPoint; peak: EventPoint; lastS: number; line: number } | null = null
  const close = (endS: number) => {
    if (!open) return
    const durationS = endS - open.start.timeS
    if (durationS + 1e-9 < minDurationS) short++
    else if (events.length >= maxEvents) dropped++
    else events.push({ kind: open.kind, startS: open.start.timeS, endS, durationS, peakSlip: open.peak.slip, start: open.start, peak: open.peak, startLine: open.line })
    open = null
  }
  return {
    sample(state, p, line) {
      if (open && open.kind !== state) close(p.timeS)
      if (state === null) return
      if (!open) open = { kind: state, start: { ...p }, peak: { ...p }, lastS: p.timeS, line }
      else if (Math.abs(p.slip) > Math.abs(open.peak.slip)) open.peak = { ...p }
      open.lastS = p.timeS
    },
    interrupt() { if (open) close(open.lastS) },
    events,
    get dropped() { return dropped },
    get short() { return short },
  }
}

import type { AnalysisResult } from '@/physics'

const fmt = (v: number, d: number) => v.toFixed(d)

/**
 * What the measured slip rests on: the radius calibration, how turns were handled, and the event rules.
 * Analyses stored before these existed lack the fields; they are then said to be unknown, not invented.
 */
export function LogSlipBasis({ a }: { a: Partial<Pick<AnalysisResult, 'calibration' | 'turns'>> & Pick<AnalysisResult, 'thresholds' | 'shortExcursions'> }) {
  const th = a.thresholds
  const cal = a.calibration
  const turns = a.turns
  return (
    <div className="space-y-1 text-xs text-slate-600" data-testid="slip-basis">
      <p>
        <span className="font-semibold">Tyre radius: </span>
        {cal === undefined
          ? 'not calibrated (analysed before calibration existed; analyse again)'
          : cal === null
            ? 'not calibrated (nominal radius)'
            : <span data-testid="radius-calibration" className={cal.status === 'rejected' ? 'error-text' : undefined}>{cal.status === 'applied' ? 'calibrated: ' : cal.status === 'rejected' ? 'calibration refused: ' : 'not calibrated: '}{cal.reason}.</span>}
      </p>
      {turns && (
        <p>
          <span className="font-semibold">Turns: </span>
          {turns.yawCorrected > 0 && `${turns.yawCorrected.toLocaleString('en')} samples corrected by yaw rate (track ${fmt(turns.trackWidthM, 2)} m); `}
          {turns.leftRightMean > 0 && `${turns.leftRightMean.toLocaleString('en')} samples judged on the left/right mean; `}
          {turns.uncorrected > 0 && `${turns.uncorrected.toLocaleString('en')} samples without a turn correction (no left/right pair or yaw rate logged).`}
        </p>
      )}
      <p>
        <span className="font-semibold">Events: </span>
        spin above {fmt(th.spinSlip, 3)}, lock below −{fmt(th.lockSlip, 3)} ({th.source})
        {th.exitFraction !== undefined && <>, with the wheel at least {th.minSpeedDiffKmh} km/h off the road speed; an event ends below {fmt(th.exitFraction * 100, 0)} % of its threshold or {th.exitSpeedDiffKmh} km/h</>}
        ; slip is judged from {fmt(th.minSpeedKmh, 1)} km/h; events shorter than {th.minDurationS} s are not counted ({a.shortExcursions} short excursions).
      </p>
    </div>
  )
}

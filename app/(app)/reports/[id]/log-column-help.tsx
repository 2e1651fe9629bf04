/** What the slip measurement needs from a log's columns: shown with the column mapping on the upload form. */
export function LogColumnHelp() {
  return (
    <ul className="mt-2 list-disc space-y-1 pl-5 text-xs text-slate-600" data-testid="log-column-help">
      <li>
        <strong>Road speed</strong> (<code>road_speed_kmh</code>) must come from a <strong>non-driven axle</strong> or{' '}
        <strong>satellite positioning</strong>. A speed worked out from the driven wheels makes slip zero by construction.
      </li>
      <li>
        Map <code>wheel_speed_left_kmh</code> and <code>wheel_speed_right_kmh</code> separately when the log has both: slip then uses
        their mean, so a turn does not read as slip. A <code>yaw_rate_deg_s</code> column (positive turning left) lets each wheel be
        corrected for the turn on its own.
      </li>
      <li>
        With <code>motor_torque_nm</code>, the tyre’s effective radius is calibrated on straight, steady coasting at 30 km/h or
        more (tread wear otherwise reads as slip); a change of more than ±5 % is refused and shown.
      </li>
      <li>Slip events are judged from 5 km/h; below that wheel-speed sensors are not reliable.</li>
    </ul>
  )
}

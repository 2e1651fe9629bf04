'use client'
/**
 * Runs a launch (drive map) or a lift-off (regen map) on the server for the chosen revision and
 * conditions, and shows the summary figures and the time plots.
 */
import { useMutation } from '@tanstack/react-query'
import { useState } from 'react'
import { api } from '@/app/_components/api-client'
import type { OverlayChoice } from '@/app/_components/plots/overlay-controls'
import { tableNumber, type UnitSet } from '@/maps'
import type { SimulationResponse } from '@/app/_lib/physics/simulate'
import type { ProgramMap } from './physics-state'
import { SimulationPlots } from './simulation-plots'
import { SimulationSummary } from './simulation-summary'

export function SimulationPanel({ map, rev, choice, units }: { map: ProgramMap; rev: number; choice: OverlayChoice; units: UnitSet }) {
  const launch = map.kind === 'drive'
  const [pedalPct, setPedal] = useState(100)
  const [rampS, setRamp] = useState(0)
  const [initialSpeedKmh, setSpeed] = useState(60)
  const [durationS, setDuration] = useState(launch ? 30 : 20)
  const run = useMutation({
    mutationFn: () => {
      const q = new URLSearchParams({ mode: launch ? 'launch' : 'liftoff', surface: choice.surface, loadCase: choice.loadCase, gradePct: String(choice.gradePct), durationS: String(durationS) })
      if (launch) { q.set('pedalPct', String(pedalPct)); q.set('rampS', String(rampS)) } else q.set('initialSpeedKmh', String(initialSpeedKmh))
      return api<SimulationResponse>(`/api/maps/${map.id}/revisions/${rev}/simulate?${q}`)
    },
  })
  const num = (label: string, value: number, set: (n: number) => void, min: number, max: number, step = 1) => (
    <label className="w-32">
      <span className="label">{label}</span>
      <input className="field" type="number" min={min} max={max} step={step} value={value} onChange={(e) => set(Number(e.target.value))} />
    </label>
  )
  return (
    <section className="card space-y-3" aria-label="Simulation">
      <h2 className="text-lg font-semibold">{launch ? 'Launch' : 'Lift-off'} simulation on {map.name} r{rev}</h2>
      <p className="text-sm text-slate-600">
        {launch
          ? 'From standstill, the pedal steps (ramp 0 s) or ramps to the chosen position; the map torque is limited by the motor and battery and passed through the tyre model. The model has no traction control and a rigid driveline, and looks the map up on the speed the program names (road speed unless it says driven-wheel speed): with road speed on snow or ice nothing cuts the torque when the wheels spin, so the slip can grow very large while the truck barely moves (docs/physics.md §9a).'
          : 'At the starting speed the accelerator is released; the regen map’s 0 % row brakes the drive axle until 2 km/h.'}
      </p>
      <form className="flex flex-wrap items-end gap-3" onSubmit={(e) => { e.preventDefault(); run.mutate() }}>
        {launch ? (
          <>
            {num('Pedal (%)', pedalPct, setPedal, 0, 100)}
            {num('Ramp (s)', rampS, setRamp, 0, 20, 0.1)}
          </>
        ) : (
          num('Start speed (km/h)', initialSpeedKmh, setSpeed, 3, 130)
        )}
        {num('Duration (s)', durationS, setDuration, 1, 60)}
        <button type="submit" className="btn-primary" disabled={run.isPending}>{run.isPending ? 'Running…' : `Run ${launch ? 'launch' : 'lift-off'}`}</button>
        {!launch && units.system === 'imperial' && <span className="text-xs text-slate-500">= {tableNumber(units.speedOut(initialSpeedKmh))} {units.speed}</span>}
      </form>
      {run.error && <p className="error-text" role="alert">{run.error.message}</p>}
      {run.data && (
        <>
          <SimulationSummary result={run.data} units={units} />
          <SimulationPlots result={run.data} units={units} filename={`${launch ? 'launch' : 'liftoff'}-${map.id}-r${rev}-${choice.surface}-${choice.loadCase}`} />
        </>
      )}
    </section>
  )
}

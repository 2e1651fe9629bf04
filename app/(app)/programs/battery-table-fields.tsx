'use client'
/**
 * The optional battery power table of the program form: state-of-charge and temperature breakpoints and
 * a charge and a discharge power grid in kW (stored in W). Without a table the two constants apply everywhere.
 */
import { useState } from 'react'
import { Controller, type Control, type FieldError } from 'react-hook-form'
import type { z } from 'zod'
import type { programInputSchema } from '@/app/_schemas/program'
import type { BatteryPowerTable } from '@/physics/vehicle'

type FormIn = z.input<typeof programInputSchema>
type FormOut = z.output<typeof programInputSchema>

/** Where a new table starts: the program's constants at every corner, for the engineer to edit. */
function startTable(chargeW: number, dischargeW: number): BatteryPowerTable {
  const socPct = [10, 50, 95]
  const temperatureC = [-10, 10, 25]
  const grid = (w: number) => socPct.map(() => temperatureC.map(() => w))
  return { socPct, temperatureC, chargePowerW: grid(chargeW), dischargePowerW: grid(dischargeW) }
}

/** A grid resized to new breakpoints: kept where the old one had a value, else the nearest old value. */
function resize(grid: number[][], rows: number, cols: number): number[][] {
  return Array.from({ length: rows }, (_, i) => {
    const row = grid[Math.min(i, grid.length - 1)] ?? []
    return Array.from({ length: cols }, (_, j) => row[Math.min(j, row.length - 1)] ?? 0)
  })
}

const parseList = (text: string) => text.split(',').map((s) => (s.trim() === '' ? NaN : Number(s)))

/** Every message in a nested react-hook-form error, once. */
function messages(e: unknown): string[] {
  if (!e || typeof e !== 'object') return []
  const own = typeof (e as FieldError).message === 'string' ? [(e as FieldError).message as string] : []
  const nested = Object.entries(e).filter(([k]) => k !== 'ref' && k !== 'message' && k !== 'type').flatMap(([, v]) => messages(v))
  return [...new Set([...own, ...nested])]
}

export function BatteryTableFields({ control, chargeW, dischargeW }: { control: Control<FormIn, unknown, FormOut>; chargeW?: number; dischargeW?: number }) {
  return (
    <Controller
      control={control}
      name="params.batteryPowerTable"
      render={({ field, fieldState }) => {
        const t = field.value as BatteryPowerTable | null | undefined
        return (
          <div className="sm:col-span-2 lg:col-span-3">
            <label className="flex items-center gap-2 text-sm font-semibold">
              <input
                type="checkbox"
                checked={Boolean(t)}
                onChange={(e) => field.onChange(e.target.checked ? startTable(chargeW ?? 100_000, dischargeW ?? 100_000) : null)}
              />
              Power limits over state of charge and temperature
            </label>
            <p className="text-xs text-slate-500">
              Looked up bilinearly, held at the edge values outside the breakpoints. Used at the battery corners of the release
              conditions (docs/physics.md §7a); without a table the two limits above hold at every corner.
            </p>
            {t && <TableEditor table={t} onChange={field.onChange} onBlur={field.onBlur} />}
            {messages(fieldState.error).map((m) => <p key={m} className="error-text">{m}</p>)}
          </div>
        )
      }}
    />
  )
}

function TableEditor({ table, onChange, onBlur }: { table: BatteryPowerTable; onChange: (t: BatteryPowerTable) => void; onBlur: () => void }) {
  const [socText, setSocText] = useState(table.socPct.join(', '))
  const [tempText, setTempText] = useState(table.temperatureC.join(', '))
  const axes = (socPct: number[], temperatureC: number[]) =>
    onChange({ socPct, temperatureC, chargePowerW: resize(table.chargePowerW, socPct.length, temperatureC.length), dischargePowerW: resize(table.dischargePowerW, socPct.length, temperatureC.length) })
  return (
    <div className="mt-2 space-y-3">
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label htmlFor="battery-soc" className="label">State-of-charge breakpoints <span className="normal-case text-slate-500">(%, ascending, comma-separated)</span></label>
          <input id="battery-soc" className="field" value={socText} onBlur={onBlur} onChange={(e) => { setSocText(e.target.value); axes(parseList(e.target.value), table.temperatureC) }} />
        </div>
        <div>
          <label htmlFor="battery-temp" className="label">Temperature breakpoints <span className="normal-case text-slate-500">(°C, ascending, comma-separated)</span></label>
          <input id="battery-temp" className="field" value={tempText} onBlur={onBlur} onChange={(e) => { setTempText(e.target.value); axes(table.socPct, parseList(e.target.value)) }} />
        </div>
      </div>
      {(['chargePowerW', 'dischargePowerW'] as const).map((k) => (
        <fieldset key={k}>
          <legend className="label">{k === 'chargePowerW' ? 'Charge power limit (limits regen)' : 'Discharge power limit'} <span className="normal-case text-slate-500">(kW)</span></legend>
          <div className="overflow-x-auto">
            <table className="text-sm" key={`${table.socPct.join()}|${table.temperatureC.join()}`}>
              <thead>
                <tr>
                  <th className="px-1 text-left text-xs text-slate-500">SoC \ °C</th>
                  {table.temperatureC.map((c, j) => <th key={j} className="px-1 text-xs text-slate-500">{Number.isFinite(c) ? c : '?'}</th>)}
                </tr>
              </thead>
              <tbody>
                {table[k].map((row, i) => (
                  <tr key={i}>
                    <th className="px-1 text-left text-xs text-slate-500">{Number.isFinite(table.socPct[i]) ? `${table.socPct[i]} %` : '?'}</th>
                    {row.map((w, j) => (
                      <td key={j} className="px-1">
                        <input
                          aria-label={`${k === 'chargePowerW' ? 'Charge' : 'Discharge'} power at ${table.socPct[i]} % and ${table.temperatureC[j]} °C (kW)`}
                          inputMode="decimal"
                          className="field w-20"
                          defaultValue={String(w / 1000)}
                          onBlur={onBlur}
                          onChange={(e) => {
                            const kw = e.target.value.trim() === '' ? NaN : Number(e.target.value)
                            const next = table[k].map((r, a) => r.map((x, b) => (a === i && b === j ? Number((kw * 1000).toPrecision(12)) : x)))
                            onChange({ ...table, [k]: next })
                          }}
                        />
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </fieldset>
      ))}
    </div>
  )
}

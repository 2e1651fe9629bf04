'use client'
import { useState } from 'react'
import { useController, type Control, type FieldPath, type FieldValues } from 'react-hook-form'

/**
 * A number input that shows the stored SI value in a display unit (shown = stored ÷ scale), so the
 * form and the API share one schema in SI while the engineer types kW or %.
 */
export function ScaledNumberInput<T extends FieldValues>(props: {
  control: Control<T>
  name: FieldPath<T>
  label: string
  unit: string
  scale?: number
  /** Help text under the field. */
  hint?: string
}) {
  const scale = props.scale ?? 1
  const { field, fieldState } = useController({ control: props.control, name: props.name })
  const stored = field.value as number | undefined
  const [text, setText] = useState(() => (typeof stored === 'number' && Number.isFinite(stored) ? String(round(stored / scale)) : ''))
  const id = `f-${props.name}`
  return (
    <div>
      <label htmlFor={id} className="label">
        {props.label} {props.unit && <span className="normal-case text-slate-500">({props.unit})</span>}
      </label>
      <input
        id={id}
        inputMode="decimal"
        className="field"
        value={text}
        aria-invalid={Boolean(fieldState.error)}
        aria-describedby={props.hint ? `${id}-hint` : undefined}
        onBlur={field.onBlur}
        onChange={(e) => {
          setText(e.target.value)
          const t = e.target.value.trim()
          field.onChange(t === '' ? undefined : toStored(Number(t), scale))
        }}
      />
      {props.hint && <p id={`${id}-hint`} className="mt-0.5 text-xs text-slate-600">{props.hint}</p>}
      {fieldState.error && <p className="error-text">{fieldState.error.message}</p>}
    </div>
  )
}

/**
 * Typed value × scale without float noise (93 × 0.01 is 0.9300000000000001): retyping the shown
 * value must store exactly what was there, or the program would count a change that is none.
 */
function toStored(shown: number, scale: number): number {
  return scale === 1 || !Number.isFinite(shown) ? shown : Number((shown * scale).toPrecision(12))
}

function round(v: number): number {
  return Math.round(v * 1e9) / 1e9 // hide float noise such as 0.9300000000000001 after ÷ 0.01
}

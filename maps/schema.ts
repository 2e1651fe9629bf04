/**
 * zod schema of a map table, for API bodies and fromJson. Structural only (finite numbers,
 * 2–64 breakpoints per axis, strictly increasing axes, values shape); the vehicle rules live
 * in validate, because a map that breaks them must still be storable to be fixed.
 */
import { z } from 'zod'
import { MAP_KINDS, MAX_BREAKPOINTS, MIN_BREAKPOINTS, type MapTable } from './table'

// zod 4 numbers already refuse NaN and ±Infinity; the message says what a reader needs.
const finite = z.number({ error: 'must be a finite number' })

const axis = (name: string) =>
  z
    .array(finite)
    .min(MIN_BREAKPOINTS, `the ${name} axis needs at least ${MIN_BREAKPOINTS} breakpoints`)
    .max(MAX_BREAKPOINTS, `the ${name} axis allows at most ${MAX_BREAKPOINTS} breakpoints`)

function increasing(values: number[], key: 'rowAxis' | 'colAxis', name: string, ctx: z.RefinementCtx): void {
  for (let i = 1; i < values.length; i++)
    if (!(values[i] > values[i - 1]))
      ctx.addIssue({ code: 'custom', path: [key, i], message: `${name} breakpoint ${values[i]} is not greater than the previous one (${values[i - 1]})` })
}

/**
 * @example mapTableSchema.safeParse(JSON.parse(body)) // { success: true, data: MapTable } or issues with paths
 */
export const mapTableSchema = z
  .object({
    kind: z.enum(MAP_KINDS, { error: "kind must be 'drive' or 'regen'" }),
    rowAxis: axis('pedal'),
    colAxis: axis('speed'),
    values: z.array(z.array(finite)).max(MAX_BREAKPOINTS),
  })
  .superRefine((t, ctx) => {
    increasing(t.rowAxis, 'rowAxis', 'pedal', ctx)
    increasing(t.colAxis, 'colAxis', 'speed', ctx)
    if (t.values.length !== t.rowAxis.length)
      ctx.addIssue({ code: 'custom', path: ['values'], message: `there are ${t.values.length} value rows for ${t.rowAxis.length} pedal breakpoints` })
    t.values.forEach((row, r) => {
      if (row.length !== t.colAxis.length)
        ctx.addIssue({ code: 'custom', path: ['values', r], message: `value row ${r + 1} has ${row.length} values for ${t.colAxis.length} speed breakpoints` })
    })
  }) satisfies z.ZodType<MapTable>

export type MapTableInput = z.input<typeof mapTableSchema>

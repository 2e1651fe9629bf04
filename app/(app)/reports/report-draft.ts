/**
 * The unsent report kept in the browser, so a dropped connection at the track loses nothing.
 * A draft is incomplete by nature, so it is checked for shape, not for the API's rules: a field
 * of the wrong type (NaN stored as null, a surface this version no longer knows) is dropped on
 * its own and the form shows its default there; the form's own schema judges the rest on submit.
 */
import { z } from 'zod'
import { flagSchema, RATING_KEYS, reportInputSchema } from '@/app/_schemas/report'

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v)

/** An object whose fields are all optional, and whose fields of the wrong type are left out rather than failing it. */
function lenient<Shape extends Record<string, z.ZodType>>(shape: Shape) {
  const fits = (k: string, v: unknown) => Object.hasOwn(shape, k) && shape[k].safeParse(v).success
  return z.preprocess((raw) => (isRecord(raw) ? Object.fromEntries(Object.entries(raw).filter(([k, v]) => fits(k, v))) : raw), z.object(shape).partial())
}

const draftValuesSchema = lenient({
  setId: z.number(),
  drivenOn: z.string(),
  vehicleUnit: z.string(),
  route: z.string(),
  surface: reportInputSchema.shape.surface,
  weather: z.string(),
  ambientC: z.number(),
  loadCase: reportInputSchema.shape.loadCase,
  payloadKg: z.number(),
  trailer: z.boolean(),
  ratings: z.partialRecord(z.enum(RATING_KEYS), z.number()),
  comments: z.string(),
  flags: z.array(lenient({ map: flagSchema.shape.map, pedalPct: z.number(), speedKmh: z.number(), what: z.string(), severity: flagSchema.shape.severity })),
})

export const reportDraftSchema = lenient({
  /** Sent as the Idempotency-Key: filing the same draft twice files one report. */
  id: z.string().max(100),
  values: draftValuesSchema,
  /** The program chosen before its set (a draft from before sets kept mapId and revisionNumber: dropped). */
  programId: z.number().int().positive(),
  savedAt: z.string(),
})

export type ReportDraft = z.output<typeof reportDraftSchema>

const PREFIX = 'mapwright.report-draft.v1'
/** One draft for a new report, and one per report being edited. */
export const reportDraftKey = (reportId?: number) => (reportId ? `${PREFIX}.${reportId}` : PREFIX)

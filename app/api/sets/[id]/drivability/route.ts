import { z } from 'zod'
import { withRole } from '@/app/_lib/http/access'
import { intParam } from '@/app/_lib/http/request'
import { loadCaseField, queryObject, surfaceField } from '@/app/_lib/physics/query'
import { drivabilityQuerySchema, run, setDrivability } from '@/app/_lib/sets/drivability'
import { loadSet } from '@/app/_lib/sets/service'
import { ValidationError } from '@/app/_lib/http/errors'
import { MANOEUVRES } from '@/physics/drivability'

const traceSchema = z.object({ manoeuvre: z.enum(MANOEUVRES, { error: `manoeuvre must be one of ${MANOEUVRES.join(', ')}` }), surface: surfaceField, loadCase: loadCaseField })

// GET /api/sets/:id/drivability?tipInSpeedKmh=&tipInFromPct=&tipInToPct=&tipOutSpeedKmh=&tipOutFromPct=&launchPedalPct=
//   [&manoeuvre=&surface=&loadCase=] — tip-in, tip-out and launch through the set's ramps on every release
//   condition, judged against the comfort limits; with manoeuvre, surface and load case also that run's traces
export const GET = withRole<{ id: string }>('signed-in', async (req, { params }) => {
  const set = await loadSet(intParam(params.id, 'Set id'))
  const raw = queryObject(req)
  const parsed = drivabilityQuerySchema.safeParse(raw)
  if (!parsed.success) throw new ValidationError(parsed.error.issues.map((i) => i.message).join('; '))
  const result = setDrivability(set, parsed.data)
  if (!raw.manoeuvre) return Response.json(result)
  const t = traceSchema.safeParse(raw)
  if (!t.success) throw new ValidationError(t.error.issues.map((i) => i.message).join('; '))
  const r = run(set, parsed.data, t.data.manoeuvre, t.data.surface, t.data.loadCase)
  const col = (k: 't' | 'pedalPct' | 'speedKmh' | 'wheelSpeedKmh' | 'slip' | 'motorTorqueNm' | 'accelMps2' | 'jerkMps3') => r.samples.map((s) => Number(s[k].toPrecision(5)))
  return Response.json({
    ...result,
    trace: { ...t.data, pedalAtS: r.pedalAtS, summary: r.summary, series: { t: col('t'), pedalPct: col('pedalPct'), speedKmh: col('speedKmh'), wheelSpeedKmh: col('wheelSpeedKmh'), slip: col('slip'), motorTorqueNm: col('motorTorqueNm'), accelMps2: col('accelMps2'), jerkMps3: col('jerkMps3') } },
  })
})

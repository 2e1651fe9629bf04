import { withRole } from '@/app/_lib/http/access'
import { NotFoundError } from '@/app/_lib/http/errors'
import { intParam } from '@/app/_lib/http/request'
import { physics } from '@/app/_lib/physics/query'
import { LOW_SPEED_KMH, tractionTable } from '@/app/_lib/physics/traction'
import { getProgram } from '@/db/queries/programs'

// GET /api/programs/:id/traction — drive and regen force limits of the drive axle per surface and load case, with the motor torque that reaches them
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const id = intParam(params.id, 'Program id')
  const program = await getProgram(id)
  if (!program) throw new NotFoundError(`Vehicle program ${id}`)
  return Response.json({ programId: program.id, lowSpeedKmh: LOW_SPEED_KMH, rows: physics(() => tractionTable(program.params)) })
})

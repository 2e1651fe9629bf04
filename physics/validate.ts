/** Validation of a whole vehicle program against the shared contract schema. */
import { PhysicsInputError } from './errors'
import { vehicleParamsSchema, type VehicleParams } from './vehicle'

/**
 * Throws {@link PhysicsInputError} (field = `vehicle.<path>`) unless `v` satisfies
 * `vehicleParamsSchema` (positive masses, CG between the axles, finite numbers …). Returns `v` unchanged.
 * @example validateVehicle({ ...truck, emptyMassKg: -1 }) // throws, field "vehicle.emptyMassKg"
 */
export function validateVehicle(v: VehicleParams): VehicleParams {
  const r = vehicleParamsSchema.safeParse(v)
  if (!r.success) {
    const issue = r.error.issues[0]
    const path = issue.path.map(String).join('.')
    throw new PhysicsInputError(path ? `vehicle.${path}` : 'vehicle', issue.message)
  }
  return v
}

/**
 * The map limits of a vehicle program, or null when its parameters give none (the program is
 * being set up). The editor then still works; only the limit rules, the clamp and the plot's
 * limit curve are off.
 */
import { limitsFromVehicle, MapInputError, type MapLimits } from '@/maps'
import type { VehicleParams } from '@/physics/vehicle'

export function limitsOrNull(params: VehicleParams): MapLimits | null {
  try {
    return limitsFromVehicle(params)
  } catch (e) {
    if (e instanceof MapInputError) return null
    throw e
  }
}

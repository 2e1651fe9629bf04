// Shared by the drivability service and the program form (a client component), so no server-only import here.

/**
 * Comfort limits when the parameter version states none. Common practice, values recalled from memory:
 * longitudinal jerk above about 5 m/s³ is felt as a jolt by a seated occupant, and a driver expects most of
 * a torque request within about a second. Replace them with the program's own targets and their source.
 */
export const DEFAULT_COMFORT = {
  maxPeakJerkMps3: 5,
  maxTimeTo90S: 1,
  source: 'Common practice (recalled from memory): a jolt is felt above about 5 m/s³; most of a request is expected within about 1 s',
} as const

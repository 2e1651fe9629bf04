/**
 * Typed input errors for the physics module. Every public function validates its inputs and
 * throws {@link PhysicsInputError} naming the offending field, never returns NaN silently.
 */

/**
 * Thrown when a physics input is out of its physical domain (negative mass, CG behind the
 * drive axle, NaN, non-finite …). `field` names the input, e.g. `"massKg"` or `"vehicle.wheelbaseM"`.
 *
 * @example
 * try { tractionLimit({ massKg: -1, wheelbaseM: 4, cgToFrontAxleM: 2, cgHeightM: 1 }, 0.8) }
 * catch (e) { if (e instanceof PhysicsInputError) console.log(e.field) } // "massKg"
 */
export class PhysicsInputError extends Error {
  readonly field: string
  constructor(field: string, message: string) {
    super(`${field}: ${message}`)
    this.name = 'PhysicsInputError'
    this.field = field
  }
}

/** Throws unless `value` is a finite number. Returns it. @example requireFinite('slip', 0.1) // 0.1 */
export function requireFinite(field: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value))
    throw new PhysicsInputError(field, `must be a finite number (got ${String(value)})`)
  return value
}

/** Throws unless `value` is finite and > 0. @example requirePositive('massKg', 1000) // 1000 */
export function requirePositive(field: string, value: number): number {
  requireFinite(field, value)
  if (value <= 0) throw new PhysicsInputError(field, `must be greater than 0 (got ${value})`)
  return value
}

/** Throws unless `value` is finite and ≥ 0. @example requireNonNegative('inertia', 0) // 0 */
export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value)
  if (value < 0) throw new PhysicsInputError(field, `must not be negative (got ${value})`)
  return value
}

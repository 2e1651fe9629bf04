/**
 * The program form registers optional groups (tandem details, battery corners) even when the engineer
 * leaves them empty; react-hook-form then holds `tandem: { interAxleTransfer: undefined }` or
 * `batteryCorners: []`. Sent as they are they would count as a change and make a parameter version
 * that changes nothing, so the form drops what is empty before comparing and saving.
 */

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v)

/** An object without undefined members; null when nothing defined is left. @example definedOnly({ a: undefined }) // null */
function definedOnly(v: Record<string, unknown>): Record<string, unknown> | null {
  const kept = Object.fromEntries(Object.entries(v).filter(([, x]) => x !== undefined))
  return Object.keys(kept).length ? kept : null
}

/**
 * Form values with empty optional groups removed: `params.tandem` without any value, a battery table
 * ticked off (null), an empty `releaseConditions.batteryCorners` and an unset `minLiftOffDecelMps2`.
 * @example tidyProgramValues({ params: { tandem: {} }, releaseConditions: { batteryCorners: [] } }) // { params: {}, releaseConditions: {} }
 */
export function tidyProgramValues<T extends { params?: unknown; releaseConditions?: unknown }>(values: T): T {
  const out: Record<string, unknown> = { ...values }
  if (isObject(values.params)) {
    const { tandem, batteryPowerTable, ...params } = values.params
    const t = isObject(tandem) ? definedOnly(tandem) : tandem
    out.params = {
      ...params,
      ...(t === null || t === undefined ? {} : { tandem: t }),
      ...(batteryPowerTable === null || batteryPowerTable === undefined ? {} : { batteryPowerTable }),
    }
  }
  if (isObject(values.releaseConditions)) {
    const { batteryCorners, minLiftOffDecelMps2, ...rc } = values.releaseConditions
    out.releaseConditions = {
      ...rc,
      ...(Array.isArray(batteryCorners) && batteryCorners.length ? { batteryCorners } : {}),
      ...(minLiftOffDecelMps2 !== undefined && minLiftOffDecelMps2 !== null ? { minLiftOffDecelMps2 } : {}),
    }
  }
  return out as T
}

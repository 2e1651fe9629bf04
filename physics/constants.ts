/** Physical constants and modelling conventions used across the physics module. */

/**
 * Standard acceleration of gravity g_n, m/s² (exact by definition).
 * Source: 3rd CGPM (1901); restated in NIST SP 330 (2019), the SI brochure.
 * @example STANDARD_GRAVITY * 1000 // weight of 1 t in N ≈ 9806.65
 */
export const STANDARD_GRAVITY = 9.80665

/**
 * Air density of the ISO 2533:1975 standard atmosphere at sea level (15 °C, 101 325 Pa), kg/m³.
 * @example 0.5 * SEA_LEVEL_AIR_DENSITY * 0.6 * 10 * 25 ** 2 // aero drag at 90 km/h, N
 */
export const SEA_LEVEL_AIR_DENSITY = 1.225

/**
 * Speed floor in the slip-ratio denominator, m/s: slip = (ΩR − V) / max(|V|, floor).
 * Common-practice regularisation (not part of SAE J670 / ISO 8855, which leave slip undefined
 * at V = 0); 0.5 m/s (1.8 km/h) is this module's choice.
 * @example slipRatio(0.05, 0) // 0.1, because 0.05 / 0.5
 */
export const SLIP_SPEED_FLOOR_MPS = 0.5

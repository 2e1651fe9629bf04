/**
 * The safety caution shown with every exported map (C header comment, docs, UI footer).
 * One text, one place, so no export path can drop or reword it.
 */
export const SAFETY_CAUTION: readonly string[] = [
  'SAFETY CAUTION',
  'The vehicle physics used to check this map is an estimate, not a measurement.',
  'A map must be proven on a closed course before it is used on public roads.',
  'Local regulations, the vehicle maker\'s functional-safety process and licensed',
  'engineering practice come first; this file does not replace any of them.',
]

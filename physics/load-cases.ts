/**
 * The load cases the physics evaluates, once, with the words the UI shows. The UI selects, the
 * zod schemas, the database CHECK constraints and the physics all derive from this list.
 * - `empty`: kerb mass at the empty CG. `laden`: gross mass at the laden CG.
 * - `trailer-empty` / `trailer-laden`: the tractor at kerb mass plus the semitrailer empty / at gross mass;
 *   offered only when the vehicle program has a semitrailer.
 */

/** Load cases in display order, with their human labels. */
export const LOAD_CASES = [
  { id: 'empty', label: 'Empty (kerb mass)', trailer: false },
  { id: 'laden', label: 'Laden (gross mass)', trailer: false },
  { id: 'trailer-empty', label: 'With empty semitrailer', trailer: true },
  { id: 'trailer-laden', label: 'With laden semitrailer', trailer: true },
] as const

export type LoadCase = (typeof LOAD_CASES)[number]['id']

/** Load case ids in display order, e.g. for `z.enum(LOAD_CASE_IDS)`. */
export const LOAD_CASE_IDS = LOAD_CASES.map((c) => c.id) as [LoadCase, ...LoadCase[]]

/** @example LOAD_CASE_LABELS['trailer-laden'] // 'With laden semitrailer' */
export const LOAD_CASE_LABELS = Object.fromEntries(LOAD_CASES.map((c) => [c.id, c.label])) as Readonly<Record<LoadCase, string>>

/** True for the cases that couple a semitrailer. @example hasTrailer('trailer-empty') // true */
export function hasTrailer(loadCase: LoadCase): boolean {
  return LOAD_CASES.some((c) => c.id === loadCase && c.trailer)
}

/**
 * The load cases a program offers: the trailer cases only when it has a semitrailer.
 * @example loadCasesFor({ trailer: null }) // ['empty', 'laden']
 */
export function loadCasesFor(v: { trailer?: unknown }): LoadCase[] {
  return LOAD_CASES.filter((c) => !c.trailer || Boolean(v.trailer)).map((c) => c.id)
}

/** The label of a stored load case id, or the id itself when it is unknown (old rows). */
export function loadCaseLabel(id: string): string {
  return (LOAD_CASE_LABELS as Readonly<Record<string, string>>)[id] ?? id
}

/**
 * Make user text safe inside generated C: identifiers and comment lines.
 */

/** Identifier base length; with the longest suffix ("_speed_axis") it stays within C99's 63 significant characters. */
const MAX_BASE = 40

/**
 * A lowercase C identifier base from free text: runs of anything but letters, digits and `_`
 * become one `_`, leading/trailing `_` go (a leading `_` plus capital, or `__`, is reserved
 * to the implementation), a leading digit gets a `map_` prefix, empty text becomes `map`.
 * The base never stands alone in the header (it always gets a suffix), so a C keyword is harmless.
 * @example cIdentifier('Drive map 3.1 (6×4)') // 'drive_map_3_1_6_4'
 */
export function cIdentifier(text: string): string {
  let id = text.replace(/[^A-Za-z0-9_]+/g, '_').replace(/_+/g, '_').replace(/^_+|_+$/g, '').toLowerCase()
  if (id === '') id = 'map'
  if (/^[0-9]/.test(id)) id = 'map_' + id
  return id.slice(0, MAX_BASE).replace(/_+$/, '')
}

/**
 * One line of comment text: printable ASCII only (a firmware toolchain may not read UTF-8),
 * no comment delimiters, no trigraph starts, at most `max` characters.
 * @example commentText('6×4 tractor\nrig') // '6x4 tractor rig'  (and a comment end becomes '* /')
 */
export function commentText(text: string, max = 120): string {
  const ascii = text
    .replace(/×/g, 'x')
    .replace(/·/g, '*')
    .replace(/[\r\n\t]+/g, ' ')
    .replace(/[^\x20-\x7e]/g, '?')
    .replace(/\*\//g, '* /')
    .replace(/\/\*/g, '/ *')
    .replace(/\?(?=\?)/g, '? ')
  return ascii.length > max ? ascii.slice(0, max - 3) + '...' : ascii
}

/** A 32-bit unsigned C literal in hex. @example hexU32(0xcbf43926) // '0xCBF43926u' */
export const hexU32 = (n: number) => '0x' + n.toString(16).toUpperCase().padStart(8, '0') + 'u'

/**
 * A data-only C header: the comment block (an empty line becomes ` *`), the include guard, `<stdint.h>`, the body
 * lines, the guard's end. One skeleton for every header the packages hold, so they read and guard alike.
 */
export function cHeaderFile(comment: readonly string[], guard: string, body: readonly string[]): string {
  return [
    '/*',
    ...comment.map((l) => (l === '' ? ' *' : ` * ${l}`)),
    ' */',
    `#ifndef ${guard}`,
    `#define ${guard}`,
    '',
    '#include <stdint.h>',
    '',
    ...body,
    '',
    `#endif /* ${guard} */`,
    '',
  ].join('\n')
}

/**
 * A paste bigger than the room left in the grid: the grid keeps what fits and this says what was
 * left out, so no value is dropped silently. Pure, so it is unit tested without a browser.
 */

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`
const span = (a: number, b: number) => (a === b ? `${a}` : `${a}–${b}`)

/**
 * The message for a block of `pastedRows` × `pastedCols` pasted with its top-left corner at grid
 * cell (`row`, `col`) of a grid `gridRows` × `gridCols` (axes included), or null when it fits.
 * Positions in the message count the pasted block's own rows and columns from 1.
 * @example pasteOverflow(5, 4, 3, 1, 4, 2) // "…2 rows were left out (pasted rows 3–4)…"
 */
export function pasteOverflow(gridRows: number, gridCols: number, row: number, col: number, pastedRows: number, pastedCols: number): string | null {
  const fitRows = Math.max(0, Math.min(pastedRows, gridRows - row))
  const fitCols = Math.max(0, Math.min(pastedCols, gridCols - col))
  const lostRows = pastedRows - fitRows
  const lostCols = pastedCols - fitCols
  if (lostRows <= 0 && lostCols <= 0) return null
  const parts = [
    lostRows > 0 && `${plural(lostRows, 'row')} (pasted rows ${span(fitRows + 1, pastedRows)})`,
    lostCols > 0 && `${plural(lostCols, 'column')} (pasted columns ${span(fitCols + 1, pastedCols)})`,
  ].filter(Boolean)
  return `The pasted block is ${pastedRows} × ${pastedCols} but only ${fitRows} × ${fitCols} fits from the selected cell: ${parts.join(' and ')} were left out. Insert breakpoints first, or paste from a cell further up or left, to keep them.`
}

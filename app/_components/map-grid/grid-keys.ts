/**
 * The spreadsheet keys the grid adds to Handsontable's own: Delete/Backspace clear the selection,
 * Ctrl+D fills down, Ctrl+R fills right (⌘ on a Mac). The browser's own meaning of Ctrl+D
 * (bookmark) and Ctrl+R (reload) is suppressed only while the grid has the keyboard.
 */
export type GridCommand = 'clear' | 'fill-down' | 'fill-right'

/** The command a key press asks for, or null for keys the grid leaves to Handsontable. */
export function gridCommand(e: Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'altKey' | 'shiftKey'>): GridCommand | null {
  if (e.altKey) return null
  const mod = e.ctrlKey || e.metaKey
  if (!mod && !e.shiftKey && (e.key === 'Delete' || e.key === 'Backspace')) return 'clear'
  if (mod && !e.shiftKey && e.key.toLowerCase() === 'd') return 'fill-down'
  if (mod && !e.shiftKey && e.key.toLowerCase() === 'r') return 'fill-right'
  return null
}

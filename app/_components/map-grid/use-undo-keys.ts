/**
 * Ctrl+Z undoes, Ctrl+Y and Ctrl+Shift+Z redo (⌘ on a Mac), anywhere on the editor page except
 * inside a text field or an open cell editor, where the browser's own text undo belongs.
 */
import { useEffect } from 'react'

export function useUndoKeys(undo: () => void, redo: () => void, isEditingCell: () => boolean) {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || e.altKey) return
      const key = e.key.toLowerCase()
      if (key !== 'z' && key !== 'y') return
      const t = e.target
      const inField = t instanceof HTMLElement && (t.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(t.tagName)) && !t.closest('.mw-grid')
      if (inField || isEditingCell()) return
      e.preventDefault()
      if (key === 'y' || e.shiftKey) redo()
      else undo()
    }
    document.addEventListener('keydown', onKey)
    return () => document.removeEventListener('keydown', onKey)
  }, [undo, redo, isEditingCell])
}

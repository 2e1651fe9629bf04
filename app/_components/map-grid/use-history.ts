/**
 * Undo and redo as a stack of whole tables. The map operations never mutate, so each entry is
 * just a reference; a 64 × 64 table is 4,096 numbers, so even hundreds of steps stay small.
 */
import { useCallback, useReducer } from 'react'
import type { MapTable } from '@/maps'

const LIMIT = 200

interface History {
  past: MapTable[]
  present: MapTable
  future: MapTable[]
}

type Action = { type: 'apply'; table: MapTable } | { type: 'undo' } | { type: 'redo' } | { type: 'reset'; table: MapTable; past?: MapTable[] }

function reduce(h: History, a: Action): History {
  switch (a.type) {
    case 'apply':
      if (a.table === h.present) return h
      return { past: [...h.past, h.present].slice(-LIMIT), present: a.table, future: [] }
    case 'undo':
      if (h.past.length === 0) return h
      return { past: h.past.slice(0, -1), present: h.past[h.past.length - 1], future: [h.present, ...h.future] }
    case 'redo':
      if (h.future.length === 0) return h
      return { past: [...h.past, h.present], present: h.future[0], future: h.future.slice(1) }
    case 'reset':
      return { past: a.past ?? [], present: a.table, future: [] }
  }
}

export function useHistory(initial: MapTable, initialPast: MapTable[] = []) {
  const [h, dispatch] = useReducer(reduce, { past: initialPast, present: initial, future: [] })
  return {
    table: h.present,
    canUndo: h.past.length > 0,
    canRedo: h.future.length > 0,
    apply: useCallback((table: MapTable) => dispatch({ type: 'apply', table }), []),
    undo: useCallback(() => dispatch({ type: 'undo' }), []),
    redo: useCallback(() => dispatch({ type: 'redo' }), []),
    /** Start over from `table`; `past` lets a restored draft still undo back to its base. */
    reset: useCallback((table: MapTable, past?: MapTable[]) => dispatch({ type: 'reset', table, past }), []),
  }
}

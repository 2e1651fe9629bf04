'use client'
/**
 * Page state mirrored into the URL query, so a view can be shared and reloaded as it is. Uses the
 * browser's history.replaceState, which the App Router picks up without a server round trip.
 */
import { useCallback, useState } from 'react'

export function useQueryState<T extends object>(initial: T): [T, (next: T) => void] {
  const [state, setState] = useState(initial)
  const update = useCallback((next: T) => {
    setState(next)
    const q = new URLSearchParams(window.location.search)
    for (const [k, v] of Object.entries(next)) q.set(k, String(v))
    window.history.replaceState(null, '', `${window.location.pathname}?${q.toString()}`)
  }, [])
  return [state, update]
}

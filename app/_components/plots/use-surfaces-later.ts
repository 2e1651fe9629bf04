'use client'
import { useEffect, useState } from 'react'
import { loadPlotLibrary } from './plot'

/**
 * False until the plot library has loaded and the browser has painted once after it. A 3-D surface
 * is the slowest figure to draw (WebGL, in software on many office machines), so pages mount their
 * surfaces only then and the 2-D heat maps and tables are drawn and usable first.
 */
export function useSurfacesLater(): boolean {
  const [ready, setReady] = useState(false)
  useEffect(() => {
    let live = true
    void loadPlotLibrary()
      .catch(() => undefined)
      .then(() => requestAnimationFrame(() => setTimeout(() => { if (live) setReady(true) }, 0)))
    return () => { live = false }
  }, [])
  return ready
}

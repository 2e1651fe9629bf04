'use client'
/**
 * The editor and the revision view load in the browser only: Handsontable needs the DOM, and
 * the draft lives in localStorage, so there is nothing useful to render on the server.
 */
import dynamic from 'next/dynamic'

function Loading() {
  return <p className="card text-sm text-slate-600">Loading the grid…</p>
}

export const MapEditorLazy = dynamic(() => import('./map-editor'), { ssr: false, loading: Loading })
export const RevisionViewerLazy = dynamic(() => import('./revision-viewer'), { ssr: false, loading: Loading })

'use client'
import dynamic from 'next/dynamic'

/** The report form runs in the browser only: it starts from the unsent draft kept there. */
export const ReportFormLoader = dynamic(() => import('./report-form').then((m) => m.ReportForm), {
  ssr: false,
  loading: () => <p className="text-sm text-slate-500">Loading the form…</p>,
})

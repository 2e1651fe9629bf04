'use client'
import type { DeepPartialSkipArrayKey } from 'react-hook-form'
import type { ReportFormIn } from './report-form'

export interface ReportDraft {
  /** Sent as the Idempotency-Key: filing the same draft twice files one report. */
  id?: string
  values: DeepPartialSkipArrayKey<ReportFormIn>
  mapId?: number
  revisionNumber?: number
  savedAt?: string
}

const PREFIX = 'mapwright.report-draft.v1'
/** One draft for a new report, and one per report being edited. */
const keyOf = (reportId?: number) => (reportId ? `${PREFIX}.${reportId}` : PREFIX)

/** The unsent report kept in the browser, so a dropped connection at the track loses nothing. */
export function loadReportDraft(reportId?: number): ReportDraft | null {
  try {
    const raw = window.localStorage.getItem(keyOf(reportId))
    return raw ? (JSON.parse(raw) as ReportDraft) : null
  } catch {
    return null
  }
}

export function saveReportDraft(d: ReportDraft, reportId?: number): void {
  try {
    window.localStorage.setItem(keyOf(reportId), JSON.stringify({ ...d, savedAt: new Date().toISOString() }))
  } catch {
    /* storage full or disabled: the form still works, only without the safety net */
  }
}

export function clearReportDraft(reportId?: number): void {
  window.localStorage.removeItem(keyOf(reportId))
}

'use client'
import type { DeepPartialSkipArrayKey } from 'react-hook-form'
import type { ReportFormIn } from './report-form'

export interface ReportDraft {
  values: DeepPartialSkipArrayKey<ReportFormIn>
  mapId?: number
  revisionNumber?: number
  savedAt?: string
}

const KEY = 'mapwright.report-draft.v1'

/** The unsent report kept in the browser, so a dropped connection at the track loses nothing. */
export function loadReportDraft(): ReportDraft | null {
  try {
    const raw = window.localStorage.getItem(KEY)
    return raw ? (JSON.parse(raw) as ReportDraft) : null
  } catch {
    return null
  }
}

export function saveReportDraft(d: ReportDraft): void {
  try {
    window.localStorage.setItem(KEY, JSON.stringify({ ...d, savedAt: new Date().toISOString() }))
  } catch {
    /* storage full or disabled: the form still works, only without the safety net */
  }
}

export function clearReportDraft(): void {
  window.localStorage.removeItem(KEY)
}

/** Where an uploaded drive log stands: uploaded → analysing → done | failed (ids as stored in drive_logs.status). */
export const LOG_STATUSES = ['uploaded', 'analysing', 'done', 'failed'] as const
export type LogStatus = (typeof LOG_STATUSES)[number]

export const LOG_STATUS_LABELS: Readonly<Record<LogStatus, string>> = {
  uploaded: 'Uploaded',
  analysing: 'Analysing',
  done: 'Analysed',
  failed: 'Failed',
}

/** Still being worked on: the page keeps polling. */
export function isLogPending(status: LogStatus): boolean {
  return status === 'uploaded' || status === 'analysing'
}

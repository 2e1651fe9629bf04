/** A timestamp as the team reads it in tables: `2026-12-01 14:05 UTC`. */
export function formatTime(d: Date | string): string {
  const date = typeof d === 'string' ? new Date(d) : d
  return `${date.toISOString().slice(0, 16).replace('T', ' ')} UTC`
}

/** The first characters of a checksum, enough to tell revisions apart at a glance. */
export function shortChecksum(c: string): string {
  return c.slice(0, 12)
}

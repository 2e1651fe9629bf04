/** A timestamp as the team reads it in tables: `2026-12-01 14:05 UTC`. */
export function formatTime(d: Date | string): string {
  const date = typeof d === 'string' ? new Date(d) : d
  return `${date.toISOString().slice(0, 16).replace('T', ' ')} UTC`
}

/** The first characters of a checksum, enough to tell revisions apart at a glance. */
export function shortChecksum(c: string): string {
  return c.slice(0, 12)
}

/**
 * Bytes as the team reads a file size, in SI units (1 kB = 1000 B, as IEC 80000-13 defines the k prefix):
 * under 1 MB in kB, so a small log never reads "0.0 MB". @example formatBytes(48_213) // '48.2 kB'
 */
export function formatBytes(n: number): string {
  if (n < 1000) return `${n} B`
  if (n < 999_950) return `${(n / 1000).toFixed(1)} kB`
  return `${(n / 1_000_000).toFixed(1)} MB`
}

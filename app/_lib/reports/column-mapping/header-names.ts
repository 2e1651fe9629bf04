/**
 * A log's header names read in the browser, before anything is uploaded: the first line of the file
 * (the first 64 kB at most), split at its delimiter — the most frequent of comma, semicolon and tab,
 * as the server's reader decides it. Quotes around a name are removed.
 */
const DELIMITERS = [',', ';', '\t'] as const
/** How much of the file is read to find the first line: as much as the server allows a header line. */
export const HEADER_READ_BYTES = 65_536

/** The header names of a log's first line. Throws an Error saying why when the line is not a CSV header. */
export function headerNames(text: string): string[] {
  const line = text.replace(/^\uFEFF/, '').split(/\r?\n|\r/, 1)[0] ?? ''
  if (line.trim() === '') throw new Error('The file’s first line is empty; a log starts with its column names')
  let best = ''
  let most = 0
  for (const d of DELIMITERS) {
    const k = line.split(d).length - 1
    if (k > most) {
      most = k
      best = d
    }
  }
  if (!best) throw new Error('The file’s first line has no comma, semicolon or tab between column names; is it a CSV log?')
  return line.split(best).map((h) => h.trim().replace(/^"(.*)"$/, '$1').trim())
}

/** The header names of a file the driver picked, from its first 64 kB only. */
export async function readFileHeader(file: Blob): Promise<string[]> {
  return headerNames(await file.slice(0, HEADER_READ_BYTES).text())
}

/** The header names of a stored log (to map it again), reading only until its first line break. */
export async function readStoredHeader(url: string): Promise<string[]> {
  const res = await fetch(url)
  if (!res.ok || !res.body) throw new Error(`The stored log could not be read (${res.status})`)
  const reader = res.body.getReader()
  const decoder = new TextDecoder()
  let text = ''
  try {
    while (!/[\r\n]/.test(text) && text.length < HEADER_READ_BYTES) {
      const { done, value } = await reader.read()
      if (done) break
      text += decoder.decode(value, { stream: true })
    }
  } finally {
    await reader.cancel().catch(() => {})
  }
  return headerNames(text)
}

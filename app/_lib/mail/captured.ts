import 'server-only'
import fs from 'node:fs'
import { z } from 'zod'
import { env } from '../config/env'

/** One line of the capture file, as the local SMTP stand-in writes it. */
const capturedLine = z.object({ receivedAt: z.string(), from: z.string(), to: z.array(z.string()), raw: z.string() })

export interface CapturedMessage {
  receivedAt: string
  from: string
  to: string[]
  subject: string
  body: string
}

/** Undo quoted-printable soft breaks and =XX escapes (RFC 2045 §6.7) for display. */
function decodeQuotedPrintable(s: string): string {
  const bytes = s.replace(/=\r?\n/g, '').replace(/=([0-9A-F]{2})/gi, (_m, h: string) => String.fromCharCode(parseInt(h, 16)))
  return Buffer.from(bytes, 'latin1').toString('utf8')
}

/** Decode RFC 2047 encoded words in a header (the subject). */
function decodeHeader(s: string): string {
  return s.replace(/\r?\n\s+/g, ' ').replace(/=\?UTF-8\?([QB])\?([^?]*)\?=\s*/gi, (_m, enc: string, text: string) =>
    enc.toUpperCase() === 'B' ? Buffer.from(text, 'base64').toString('utf8') : decodeQuotedPrintable(text.replace(/_/g, ' ')),
  )
}

/** What the local capture server received, newest first (demo and test installs only). */
export function readCapturedMail(limit = 200): CapturedMessage[] {
  const file = env().MAIL_OUTBOX_FILE
  if (!file || !fs.existsSync(file)) return []
  const lines = fs.readFileSync(file, 'utf8').trim().split('\n').filter(Boolean).slice(-limit).reverse()
  return lines.map((l) => {
    const m = capturedLine.parse(JSON.parse(l))
    const split = m.raw.search(/\r?\n\r?\n/)
    const head = m.raw.slice(0, split)
    const subject = /^Subject: (.*(?:\r?\n[ \t].*)*)/im.exec(head)?.[1] ?? ''
    const qp = /Content-Transfer-Encoding: quoted-printable/i.test(head)
    const body = m.raw.slice(split).trim()
    return { receivedAt: m.receivedAt, from: m.from, to: m.to, subject: decodeHeader(subject), body: qp ? decodeQuotedPrintable(body) : body }
  })
}

import nodemailer, { type Transporter } from 'nodemailer'
import { dueMail, markFailed, markSent } from '@/db/queries/mail'
import { env } from './env'

const key = Symbol.for('mapwright.mail')
type G = typeof globalThis & { [key]?: { transport: Transporter; timer: NodeJS.Timeout; busy: boolean } }

function state() {
  const g = globalThis as G
  if (!g[key]) {
    const url = env().SMTP_URL
    if (!url) return null
    const transport = nodemailer.createTransport(url)
    // Retries that were deferred by back-off are picked up by this timer; unref: never keeps a process alive.
    const timer = setInterval(() => void deliverPending(), 30_000)
    timer.unref()
    g[key] = { transport, timer, busy: false }
  }
  return g[key]!
}

/**
 * Send what is due in the outbox. A failed send stays queued with its error and is retried with
 * back-off; the transition that queued it has already committed, so nothing is lost.
 */
export async function deliverPending(): Promise<{ sent: number; failed: number }> {
  const s = state()
  if (!s || s.busy) return { sent: 0, failed: 0 }
  s.busy = true
  let sent = 0
  let failed = 0
  try {
    for (const m of await dueMail()) {
      try {
        await s.transport.sendMail({ from: env().MAIL_FROM, to: m.to, subject: m.subject, text: m.text })
        await markSent(m.id)
        sent++
      } catch (e) {
        await markFailed(m.id, m.attempts, e instanceof Error ? e.message : String(e))
        failed++
      }
    }
  } finally {
    s.busy = false
  }
  return { sent, failed }
}

/** Kick the sender after a change queued mail, without making the request wait for SMTP. */
export function nudgeMail(): void {
  void deliverPending().catch((e) => console.error('mail delivery failed', e))
}

/** The public base URL for links in e-mails. */
export function appUrl(path: string): string {
  return new URL(path, env().NEXTAUTH_URL ?? 'http://127.0.0.1:3000').toString()
}

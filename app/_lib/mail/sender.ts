import 'server-only'
import nodemailer, { type Transporter } from 'nodemailer'
import { claimMail, dueMail, markFailed, markSent } from '@/db/queries/mail'
import { env } from '../config/env'

const key = Symbol.for('mapwright.mail')
type G = typeof globalThis & { [key]?: { transport: Transporter; timer: NodeJS.Timeout; queue: Promise<unknown> } }

function state() {
  const g = globalThis as G
  if (!g[key]) {
    const url = env().SMTP_URL
    if (!url) return null
    const transport = nodemailer.createTransport(url)
    // Retries that were deferred by back-off are picked up by this timer; unref: never keeps a process alive.
    const timer = setInterval(() => void deliverPending(), 30_000)
    timer.unref()
    g[key] = { transport, timer, queue: Promise.resolve() }
  }
  return g[key]!
}

/**
 * Send what is due in the outbox. A failed send stays queued with its error and is retried with
 * back-off; the transition that queued it has already committed, so nothing is lost.
 */
export async function deliverPending(): Promise<{ sent: number; failed: number }> {
  const s = state()
  if (!s) return { sent: 0, failed: 0 }
  // Runs in this process are chained, a caller waiting for the run in flight and then for its own;
  // across processes (several servers on one PostgreSQL) the claim in sendDue keeps a message to
  // one sender.
  const run = s.queue.then(() => sendDue(s.transport))
  s.queue = run.catch(() => {})
  return run
}

/** What sendDue needs of a transport: nodemailer's, or a stand-in in tests. */
export interface MailTransport {
  sendMail(message: { from?: string; to: string[]; subject: string; text: string }): Promise<unknown>
}

/**
 * One unchained run over the due mail; deliverPending is the entry point (exported for tests). Each
 * message is claimed first and sent only by the run whose claim succeeded, so runs in other
 * processes at the same time never send it too.
 */
export async function sendDue(transport: MailTransport): Promise<{ sent: number; failed: number }> {
  let sent = 0
  let failed = 0
  for (const due of await dueMail()) {
    const m = await claimMail(due.id)
    if (!m) continue
    try {
      await transport.sendMail({ from: env().MAIL_FROM, to: m.to, subject: m.subject, text: m.text })
      await markSent(m.id)
      sent++
    } catch (e) {
      await markFailed(m.id, m.attempts, e instanceof Error ? e.message : String(e))
      failed++
    }
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

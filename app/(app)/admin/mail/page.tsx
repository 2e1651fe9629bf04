import { requirePageUser } from '@/app/_lib/auth/page-access'
import { formatTime } from '@/app/_components/format'
import { readCapturedMail } from '@/app/_lib/mail/captured'
import { listOutbox } from '@/db/queries/mail'
import { RetryButton } from './retry-button'

export const metadata = { title: 'E-mail' }

export default async function MailPage() {
  await requirePageUser(['admin'])
  const [outbox, captured] = [await listOutbox(100), readCapturedMail(100)]
  return (
    <div className="space-y-5">
      <h1 className="text-2xl font-bold">E-mail</h1>
      <p className="text-sm text-slate-600">Open a subject to read the message. An invitation or reset link in it works once and only until it expires; pass it on only to the person it was sent to.</p>
      <section className="card overflow-x-auto p-0">
        <h2 className="px-3 pt-3 font-semibold">Outgoing queue</h2>
        <table className="w-full text-sm" data-testid="mail-outbox">
          <thead className="text-left text-xs uppercase text-slate-500"><tr><th className="px-3 py-2">Queued</th><th className="px-3 py-2">To</th><th className="px-3 py-2">Subject</th><th className="px-3 py-2">Status</th><th className="px-3 py-2" /></tr></thead>
          <tbody>
            {outbox.map((m) => (
              <tr key={m.id} className="border-t border-line">
                <td className="px-3 py-1.5 whitespace-nowrap">{formatTime(m.createdAt)}</td>
                <td className="px-3 py-1.5">{m.to.join(', ')}</td>
                <td className="px-3 py-1.5">
                  {/* The whole message, so an admin can pass on an invitation link by hand when mail does not arrive. */}
                  <details data-testid="outbox-message">
                    <summary className="cursor-pointer">{m.subject}</summary>
                    <pre className="mt-1 max-w-xl text-xs break-all whitespace-pre-wrap">{m.text}</pre>
                  </details>
                </td>
                <td className="px-3 py-1.5">{m.status}{m.attempts > 1 ? ` after ${m.attempts} attempts` : ''}{m.lastError ? ` — ${m.lastError}` : ''}</td>
                <td className="px-3 py-1.5">{m.status === 'failed' && <RetryButton id={m.id} />}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
      <section className="space-y-2">
        <h2 className="font-semibold">Received by the local capture server</h2>
        <p className="text-sm text-slate-600">Stands in for a real mail relay on demo and test installs (unset when SMTP_URL names a real relay).</p>
        {captured.length === 0 && <p className="text-sm text-slate-500">Nothing captured.</p>}
        {captured.map((m, i) => (
          <details key={i} className="card" data-testid="captured-mail">
            <summary className="cursor-pointer text-sm"><span className="text-slate-500">{formatTime(m.receivedAt)} → {m.to.join(', ')}:</span> {m.subject}</summary>
            <pre className="mt-2 whitespace-pre-wrap text-xs">{m.body}</pre>
          </details>
        ))}
      </section>
    </div>
  )
}

import Link from 'next/link'
import { MarkdownNotes } from './markdown-notes'

export interface WaitingItem {
  href: string
  label: string
  detail?: string
  /** Markdown shown under the item: the lead's send-back comment beside the revision it was about. */
  note?: string
}

/** One box of "what waits on you" on the overview page. */
export function WaitingList({ title, items, empty, testId }: { title: string; items: WaitingItem[]; empty: string; testId: string }) {
  return (
    <section className="card" data-testid={testId}>
      <h2 className="mb-2 font-semibold">
        {title} <span className="ml-1 rounded bg-slate-100 px-1.5 text-xs">{items.length}</span>
      </h2>
      {items.length === 0 ? (
        <p className="text-sm text-slate-500">{empty}</p>
      ) : (
        <ul className="space-y-1 text-sm">
          {items.slice(0, 12).map((i) => (
            <li key={i.href}>
              <Link href={i.href} className="text-accent hover:underline">{i.label}</Link>
              {i.detail && <span className="text-slate-600"> — {i.detail}</span>}
              {i.note && <MarkdownNotes text={i.note} className="mt-1 border-l-2 border-line pl-2" />}
            </li>
          ))}
        </ul>
      )}
    </section>
  )
}

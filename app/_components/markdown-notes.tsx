import Markdown from 'react-markdown'

/** Revision notes as markdown. react-markdown renders no raw HTML, so notes cannot inject markup. */
export function MarkdownNotes({ text }: { text: string }) {
  if (!text.trim()) return null
  return (
    <div className="prose-notes space-y-2 text-sm text-slate-700 [&_code]:rounded [&_code]:bg-slate-100 [&_code]:px-1 [&_li]:ml-5 [&_ol]:list-decimal [&_ul]:list-disc">
      <Markdown>{text}</Markdown>
    </div>
  )
}

import Markdown, { type Components } from 'react-markdown'
import remarkGfm from 'remark-gfm'

// Tables scroll inside their own box on a phone; the box is focusable so a keyboard can scroll it.
const components: Components = {
  table: ({ children }) => (
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Table in the notes">
      <table>{children}</table>
    </div>
  ),
}

/**
 * Notes and comments as GitHub-flavoured markdown (tables, task lists, strikethrough, bare links).
 * Raw HTML in the text is dropped (`skipHtml`) and react-markdown's URL filter removes
 * `javascript:` links, so a note cannot inject markup or script.
 */
export function MarkdownNotes({ text, className = '' }: { text: string; className?: string }) {
  if (!text.trim()) return null
  return (
    <div
      className={`prose-notes space-y-2 text-sm break-words text-slate-700 [&_a]:text-accent [&_a]:underline [&_code]:rounded [&_code]:bg-slate-100 [&_code]:px-1 [&_li]:ml-5 [&_ol]:list-decimal [&_ul]:list-disc [&_table]:border-collapse [&_td]:border [&_td]:border-line [&_td]:px-2 [&_td]:py-0.5 [&_th]:border [&_th]:border-line [&_th]:bg-slate-50 [&_th]:px-2 [&_th]:py-0.5 [&_th]:text-left ${className}`}
      data-testid="markdown-notes"
    >
      <Markdown remarkPlugins={[remarkGfm]} skipHtml components={components}>
        {text}
      </Markdown>
    </div>
  )
}

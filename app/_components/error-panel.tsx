'use client'
/**
 * What a page shows when rendering it failed unexpectedly. No message or stack: a server error
 * reaches the browser as a generic text, and its digest is what matches the server log line.
 */
export function ErrorPanel({ error, retry, back = { href: '/', label: 'Back to the overview' } }: { error: unknown; retry: () => void; back?: { href: string; label: string } }) {
  const digest = error instanceof Error && 'digest' in error && typeof error.digest === 'string' ? error.digest : null
  return (
    <div role="alert" className="card mx-auto mt-12 max-w-md space-y-3">
      <h1 className="text-xl font-bold">Something went wrong</h1>
      <p className="text-sm text-slate-600">This page could not be shown. Try again, or come back in a moment.</p>
      {digest && <p className="text-xs text-slate-500">Reference for the administrator: <code>{digest}</code></p>}
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn-primary" onClick={() => retry()}>Try again</button>
        {/* A plain link, not the router: it still works when the client app itself is what broke. */}
        <a href={back.href} className="btn">{back.label}</a>
      </div>
    </div>
  )
}

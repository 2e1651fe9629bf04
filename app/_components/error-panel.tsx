'use client'
/**
 * What a page shows when rendering it failed unexpectedly. No message or stack: a server error
 * reaches the browser as a generic text, and its digest is what matches the server log line.
 */
export function ErrorPanel({ error, retry }: { error: unknown; retry: () => void }) {
  const digest = error instanceof Error && 'digest' in error && typeof error.digest === 'string' ? error.digest : null
  return (
    <div role="alert" className="card mx-auto mt-12 max-w-md space-y-3">
      <h1 className="text-xl font-bold">Something went wrong</h1>
      <p className="text-sm text-slate-600">This page could not be shown. Try again, or come back in a moment.</p>
      {digest && <p className="text-xs text-slate-500">Reference for the administrator: <code>{digest}</code></p>}
      <button type="button" className="btn-primary" onClick={() => retry()}>Try again</button>
    </div>
  )
}

/** Shown while a page waits on its data (loading.tsx of the slower pages). */
export function PageLoading({ what }: { what: string }) {
  return (
    <p role="status" aria-live="polite" className="text-sm text-slate-500">
      Loading {what}…
    </p>
  )
}

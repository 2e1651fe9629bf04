'use client'
import { ErrorPanel } from './_components/error-panel'

// Catches what the group layouts themselves throw (the header cannot be trusted then).
export default function RootError(props: { error: unknown; retry: () => void }) {
  return (
    <main className="mx-auto max-w-7xl px-4 py-6">
      <ErrorPanel {...props} />
    </main>
  )
}

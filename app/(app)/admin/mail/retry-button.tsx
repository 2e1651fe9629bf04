'use client'
import { useState } from 'react'
import { useRouter } from 'next/navigation'
import { api } from '@/app/_components/api-client'

/** Retry one failed message; the server refuses a message that was sent or is queued meanwhile, and says why. */
export function RetryButton({ id }: { id: number }) {
  const router = useRouter()
  const [error, setError] = useState<string | null>(null)
  return (
    <>
      <button
        type="button"
        className="btn"
        onClick={() =>
          api('/api/admin/mail', { method: 'POST', json: { id } })
            .then(() => setError(null))
            .catch((e: Error) => setError(e.message))
            .finally(() => router.refresh())
        }
      >
        Retry now
      </button>
      {error && <p role="alert" className="error-text text-sm">{error}</p>}
    </>
  )
}

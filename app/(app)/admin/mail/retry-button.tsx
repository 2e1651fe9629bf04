'use client'
import { useRouter } from 'next/navigation'
import { api } from '@/app/_components/api-client'

export function RetryButton({ id }: { id: number }) {
  const router = useRouter()
  return (
    <button type="button" className="btn" onClick={() => api('/api/admin/mail', { method: 'POST', json: { id } }).then(() => router.refresh())}>
      Retry now
    </button>
  )
}

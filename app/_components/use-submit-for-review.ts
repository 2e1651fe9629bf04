'use client'
import { useMutation } from '@tanstack/react-query'
import { useRouter } from 'next/navigation'
import { api } from './api-client'

/**
 * "Submit for review" of one revision through the review API (the server checks the role, the
 * author and the state again), then the page is read again so lists move the revision along.
 */
export function useSubmitForReview(onDone?: (revisionId: number) => void) {
  const router = useRouter()
  return useMutation({
    mutationFn: (revisionId: number) => api(`/api/revisions/${revisionId}/actions`, { method: 'POST', json: { action: 'submit', comment: '' } }),
    onSuccess: (_answer, revisionId) => {
      onDone?.(revisionId)
      router.refresh()
    },
  })
}

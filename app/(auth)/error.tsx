'use client'
import { ErrorPanel } from '@/app/_components/error-panel'

// A sign-in or password page failed: the way back is the sign-in page, not the (signed-in) overview.
export default function AuthError(props: { error: unknown; retry: () => void }) {
  return <ErrorPanel {...props} back={{ href: '/signin', label: 'Back to sign-in' }} />
}

'use client'
import { ErrorPanel } from '@/app/_components/error-panel'

// A signed-in page failed: the app layout (header, navigation) stays, only the page is replaced.
export default function AppError(props: { error: unknown; retry: () => void }) {
  return <ErrorPanel {...props} />
}

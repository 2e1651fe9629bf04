import { PageLoading } from '@/app/_components/page-loading'

// Up to 500 audit rows with their actors are read before the table draws.
export default function Loading() {
  return <PageLoading what="the audit trail" />
}

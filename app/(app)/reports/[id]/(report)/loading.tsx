import { PageLoading } from '@/app/_components/page-loading'

// The report reads its set, logs and, for a lead, the program's sets it could be moved to.
export default function Loading() {
  return <PageLoading what="the drive report" />
}

import { PageLoading } from '@/app/_components/page-loading'

// The review page validates the table, diffs it against the release and reads its sets and reports.
export default function Loading() {
  return <PageLoading what="the revision for review" />
}

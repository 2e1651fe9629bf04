import { PageLoading } from '@/app/_components/page-loading'

// Three lists across every map of every program are read before the queue draws.
export default function Loading() {
  return <PageLoading what="the review queue" />
}

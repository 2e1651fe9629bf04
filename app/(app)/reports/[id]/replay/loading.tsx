import { PageLoading } from '@/app/_components/page-loading'

// Replaying a log runs every sample through the chosen set's maps and the traction model.
export default function Loading() {
  return <PageLoading what="the replay of this drive" />
}

import { PageLoading } from '@/app/_components/page-loading'

// The traction table is worked out for every surface and load case before the first paint.
export default function Loading() {
  return <PageLoading what="the program's physics" />
}

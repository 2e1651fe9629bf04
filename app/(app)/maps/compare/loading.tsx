import { PageLoading } from '@/app/_components/page-loading'

// Both revisions, their diff and the traction overlays are worked out before the page can draw.
// Kept to pages without an id in the path: under a loading boundary a 404 could only be streamed with status 200.
export default function Loading() {
  return <PageLoading what="the comparison" />
}

import { PageLoading } from '@/app/_components/page-loading'

// Both revisions, their diff and the traction overlays are worked out before the page can draw.
// Only on pages without an id in the path: under a loading boundary a 404 is streamed with status 200.
// The access check sits in layout.tsx, above this boundary, so its redirect keeps a real 307.
export default function Loading() {
  return <PageLoading what="the comparison" />
}

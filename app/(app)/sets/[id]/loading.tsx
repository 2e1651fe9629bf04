import { PageLoading } from '@/app/_components/page-loading'

// The gate judges every surface and load case and the test package is built: worth a word while it runs.
export default function Loading() {
  return <PageLoading what="the map set and its release gate" />
}

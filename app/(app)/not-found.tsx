import { NotFoundMessage } from '@/app/_components/not-found-message'

// notFound() from a signed-in page (e.g. /maps/abc): shown inside the app layout, header included.
export default function AppNotFound() {
  return <NotFoundMessage />
}

import { getPageUser } from './_lib/auth/page-access'
import { NotFoundMessage } from './_components/not-found-message'
import { PageFrame } from './_components/page-frame'

export const metadata = { title: 'Page not found' }

// An address no route matches: outside both route groups, so it brings its own frame.
export default async function NotFound() {
  return (
    <PageFrame user={await getPageUser()}>
      <NotFoundMessage />
    </PageFrame>
  )
}

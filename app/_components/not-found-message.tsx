import Link from 'next/link'

/** The body of every 404 page: a malformed id, an id that names nothing, or an unknown address. */
export function NotFoundMessage() {
  return (
    <div className="card mx-auto mt-12 max-w-md">
      <h1 className="mb-2 text-xl font-bold">Page not found</h1>
      <p className="mb-4 text-sm text-slate-600">Nothing lives at this address. The link may be mistyped, or what it named was never saved.</p>
      <Link href="/" className="btn">Back to the overview</Link>
    </div>
  )
}

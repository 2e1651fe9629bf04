import Link from 'next/link'

export const metadata = { title: 'Not allowed' }

export default function NotAllowedPage() {
  return (
    <div className="card mx-auto mt-12 max-w-md">
      <h1 className="mb-2 text-xl font-bold">Not allowed for your role</h1>
      <p className="mb-4 text-sm text-slate-600">This page belongs to another role. Ask an admin if you need access.</p>
      <Link href="/" className="btn">Back to the overview</Link>
    </div>
  )
}

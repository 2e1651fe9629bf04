import Link from 'next/link'
import { roleLabel } from '@/domain/roles'
import type { SessionUser } from '@/app/_lib/auth/session'
import { navFor } from './nav-items'
import { SignOutButton } from './sign-out-button'

export function SiteHeader({ user }: { user: SessionUser | null }) {
  return (
    <header className="border-b border-line bg-white">
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-4 px-4 py-3">
        <Link href="/" className="text-lg font-bold tracking-tight text-accent">
          Mapwright
        </Link>
        {user && (
          <nav aria-label="Main" className="flex flex-wrap gap-1">
            {navFor(user.role).map((item) => (
              <Link key={item.href} href={item.href} className="rounded px-2 py-1 text-sm hover:bg-accent-soft">
                {item.label}
              </Link>
            ))}
          </nav>
        )}
        <div className="ml-auto flex items-center gap-3 text-sm">
          {user ? (
            <>
              <span>
                {user.name} · <span data-testid="role-badge" className="rounded bg-accent-soft px-1.5 py-0.5 text-xs font-semibold">{roleLabel(user.role)}</span>
              </span>
              <SignOutButton />
            </>
          ) : (
            <Link href="/signin" className="btn">
              Sign in
            </Link>
          )}
        </div>
      </div>
    </header>
  )
}

'use client'
import { signIn } from 'next-auth/react'
import { useRouter } from 'next/navigation'
import { useState, type FormEvent } from 'react'

export function SignInForm() {
  const router = useRouter()
  const [error, setError] = useState<string | null>(null)
  const [busy, setBusy] = useState(false)

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault()
    const form = new FormData(e.currentTarget)
    setBusy(true)
    setError(null)
    const res = await signIn('credentials', {
      redirect: false,
      email: String(form.get('email') ?? ''),
      password: String(form.get('password') ?? ''),
    })
    setBusy(false)
    if (!res || res.error) {
      setError(res?.error?.startsWith('Too many') ? res.error : 'Wrong email or password, or the account is disabled.')
      return
    }
    router.replace('/')
    router.refresh()
  }

  return (
    <form method="post" onSubmit={onSubmit} className="card space-y-4" noValidate>
      <div>
        <label htmlFor="email" className="label">Email</label>
        <input id="email" name="email" type="email" autoComplete="username" required className="field" />
      </div>
      <div>
        <label htmlFor="password" className="label">Password</label>
        <input id="password" name="password" type="password" autoComplete="current-password" required className="field" />
      </div>
      {error && (
        <p role="alert" className="error-text text-sm">
          {error}
        </p>
      )}
      <button type="submit" className="btn-primary w-full justify-center" disabled={busy}>
        {busy ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  )
}

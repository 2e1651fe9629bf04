'use client'
import Link from 'next/link'
import { useState, type FormEvent } from 'react'
import { api } from '@/app/_components/api-client'

export function SetPasswordForm({ token }: { token: string }) {
  const [state, setState] = useState<{ ok: boolean; text: string } | null>(null)
  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault()
    const f = new FormData(e.currentTarget)
    if (f.get('password') !== f.get('confirm')) return setState({ ok: false, text: 'The two passwords differ' })
    try {
      const r = await api<{ message: string }>('/api/password/set', { method: 'POST', json: { token, password: f.get('password') } })
      setState({ ok: true, text: r.message })
    } catch (err) {
      setState({ ok: false, text: err instanceof Error ? err.message : String(err) })
    }
  }
  if (state?.ok)
    return (
      <p role="status" className="card">
        {state.text} <Link href="/signin" className="text-accent underline">Sign in</Link>
      </p>
    )
  return (
    <form method="post" onSubmit={onSubmit} className="card space-y-3">
      <div>
        <label htmlFor="password" className="label">New password (at least 10 characters)</label>
        <input id="password" name="password" type="password" autoComplete="new-password" className="field" required minLength={10} />
      </div>
      <div>
        <label htmlFor="confirm" className="label">Repeat it</label>
        <input id="confirm" name="confirm" type="password" autoComplete="new-password" className="field" required />
      </div>
      {state && <p role="alert" className="error-text text-sm">{state.text}</p>}
      <button type="submit" className="btn-primary">Set password</button>
    </form>
  )
}

'use client'
import { useState, type FormEvent } from 'react'
import { api } from '@/app/_components/api-client'

export function ForgotPasswordForm() {
  const [msg, setMsg] = useState<{ ok: boolean; text: string } | null>(null)
  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault()
    const email = new FormData(e.currentTarget).get('email')
    try {
      const r = await api<{ message: string }>('/api/password/forgot', { method: 'POST', json: { email } })
      setMsg({ ok: true, text: r.message })
    } catch (err) {
      setMsg({ ok: false, text: err instanceof Error ? err.message : String(err) })
    }
  }
  return (
    <form method="post" onSubmit={onSubmit} className="card space-y-3">
      <div>
        <label htmlFor="email" className="label">Email</label>
        <input id="email" name="email" type="email" className="field" required />
      </div>
      {msg && <p role={msg.ok ? 'status' : 'alert'} className={msg.ok ? 'text-sm text-accent' : 'error-text text-sm'}>{msg.text}</p>}
      <button type="submit" className="btn-primary">Send the link</button>
    </form>
  )
}

'use client'
import { useForm, type Resolver } from 'react-hook-form'
import { z } from 'zod'
import { zodResolver } from '@hookform/resolvers/zod'
import { useMutation } from '@tanstack/react-query'
import { useState } from 'react'
import { api } from '@/app/_components/api-client'
import { ROLE_LABELS, ROLES } from '@/domain/roles'
import { createUserSchema, type CreateUserInput } from '@/app/_schemas/user'

export function NewUserForm({ onCreated }: { onCreated: () => void }) {
  const [invite, setInvite] = useState(false)
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null)
  const { register, handleSubmit, reset, formState } = useForm<CreateUserInput>({
    // An invitee sets their own password, so the form does not ask for one.
    resolver: zodResolver(invite ? createUserSchema.extend({ password: createUserSchema.shape.password.optional().or(z.literal('')) }) : createUserSchema) as Resolver<CreateUserInput>,
    defaultValues: { role: 'test_driver' },
  })
  const create = useMutation({
    mutationFn: (input: CreateUserInput) =>
      invite
        ? api<{ user: { email: string } }>('/api/users/invite', { method: 'POST', json: { email: input.email, name: input.name, role: input.role } })
        : api<{ user: { email: string } }>('/api/users', { method: 'POST', json: input }),
    onSuccess: ({ user }) => {
      setMessage({ ok: true, text: invite ? `Invited ${user.email}: a one-time link is on its way.` : `Created ${user.email}.` })
      reset({ role: 'test_driver', email: '', name: '', password: '' })
      onCreated()
    },
    onError: (e) => setMessage({ ok: false, text: e.message }),
  })
  const err = formState.errors
  return (
    <form method="post" onSubmit={handleSubmit((v) => create.mutate(v))} className="card grid gap-4 md:grid-cols-2" noValidate>
      <h2 className="font-semibold md:col-span-2">New user</h2>
      <div>
        <label htmlFor="nu-name" className="label">Name</label>
        <input id="nu-name" className="field" {...register('name')} />
        {err.name && <p className="error-text">{err.name.message}</p>}
      </div>
      <div>
        <label htmlFor="nu-email" className="label">Email</label>
        <input id="nu-email" type="email" className="field" {...register('email')} />
        {err.email && <p className="error-text">{err.email.message}</p>}
      </div>
      <div>
        <label htmlFor="nu-role" className="label">Role</label>
        <select id="nu-role" className="field" {...register('role')}>
          {ROLES.map((r) => (
            <option key={r} value={r}>{ROLE_LABELS[r]}</option>
          ))}
        </select>
      </div>
      <label className="flex items-center gap-2 text-sm md:col-span-2">
        <input type="checkbox" checked={invite} onChange={(e) => setInvite(e.target.checked)} /> Invite by e-mail (they set their own password through a one-time link)
      </label>
      {!invite && <div>
        <label htmlFor="nu-password" className="label">Initial password</label>
        <input id="nu-password" type="password" autoComplete="new-password" className="field" {...register('password')} />
        {err.password && <p className="error-text">{err.password.message}</p>}
      </div>}
      <div className="md:col-span-2 flex items-center gap-3">
        <button type="submit" className="btn-primary" disabled={create.isPending}>{invite ? 'Send invitation' : 'Create user'}</button>
        {message && (
          <p role={message.ok ? 'status' : 'alert'} className={message.ok ? 'text-sm text-accent' : 'error-text text-sm'}>
            {message.text}
          </p>
        )}
      </div>
    </form>
  )
}

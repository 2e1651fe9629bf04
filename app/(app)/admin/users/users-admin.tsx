'use client'
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query'
import { useState } from 'react'
import { api } from '@/app/_components/api-client'
import { isRole, ROLE_LABELS, ROLES, type Role } from '@/domain/roles'
import { NewUserForm } from './new-user-form'

interface UserJson {
  id: number
  email: string
  name: string
  role: Role
  disabled: boolean
  /** Invited and has not set a password yet. */
  invited: boolean
}

export function UsersAdmin({ myId }: { myId: number }) {
  const qc = useQueryClient()
  const [error, setError] = useState<string | null>(null)
  // What the last change did, said once it is saved (a select's new value alone does not say it was kept).
  const [saved, setSaved] = useState<string | null>(null)
  const users = useQuery({ queryKey: ['users'], queryFn: () => api<{ users: UserJson[] }>('/api/users') })
  const patch = useMutation({
    mutationFn: ({ id, ...body }: { id: number; email: string; role?: Role; disabled?: boolean }) =>
      api(`/api/users/${id}`, { method: 'PATCH', json: { role: body.role, disabled: body.disabled } }),
    onMutate: () => setSaved(null),
    onSuccess: (_r, v) => {
      setError(null)
      setSaved(
        v.role !== undefined
          ? `Saved: ${v.email} is now ${ROLE_LABELS[v.role]}. It applies from their next page.`
          : `Saved: ${v.email} is ${v.disabled ? 'disabled and signed out everywhere' : 'enabled again'}.`,
      )
      return qc.invalidateQueries({ queryKey: ['users'] })
    },
    onError: (e) => setError(e.message),
  })
  const resend = useMutation({
    mutationFn: (u: UserJson) => api<{ message: string }>(`/api/users/${u.id}/invite`, { method: 'POST' }),
    onMutate: () => setSaved(null),
    onSuccess: (r) => {
      setError(null)
      setSaved(r.message)
    },
    onError: (e) => setError(e.message),
  })

  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Users</h1>
      {error && <p role="alert" className="error-text text-sm">{error}</p>}
      <p role="status" className={saved ? 'rounded bg-accent-soft px-3 py-2 text-sm' : 'sr-only'} data-testid="users-saved">{saved ?? ''}</p>
      <div className="card overflow-x-auto p-0">
        <table className="w-full text-sm">
          <thead className="bg-slate-50 text-left text-xs uppercase text-slate-600">
            <tr>
              <th className="px-3 py-2">Name</th>
              <th className="px-3 py-2">Email</th>
              <th className="px-3 py-2">Role</th>
              <th className="px-3 py-2">Status</th>
            </tr>
          </thead>
          <tbody>
            {users.data?.users.map((u) => (
              <tr key={u.id} className="border-t border-line" data-testid={`user-row-${u.email}`}>
                <td className="px-3 py-2">{u.name}</td>
                <td className="px-3 py-2">{u.email}</td>
                <td className="px-3 py-2">
                  <select
                    aria-label={`Role of ${u.email}`}
                    className="field py-1"
                    value={u.role}
                    onChange={(e) => isRole(e.target.value) && patch.mutate({ id: u.id, email: u.email, role: e.target.value })}
                  >
                    {ROLES.map((r) => (
                      <option key={r} value={r}>{ROLE_LABELS[r]}</option>
                    ))}
                  </select>
                </td>
                <td className="space-y-1 px-3 py-2">
                  {u.invited && !u.disabled && (
                    <p className="flex flex-wrap items-center gap-2">
                      <span className="rounded bg-amber-100 px-1.5 py-0.5 text-xs font-semibold text-amber-900" data-testid="invited-badge">Invited</span>
                      <span className="text-xs text-slate-600">no password set yet</span>
                      <button type="button" className="btn py-0.5" disabled={resend.isPending} onClick={() => resend.mutate(u)} aria-label={`Send again: the invitation to ${u.email}`}>
                        Send again
                      </button>
                    </p>
                  )}
                  <button
                    type="button"
                    className="btn"
                    disabled={u.id === myId}
                    title={u.id === myId ? 'You cannot disable yourself' : undefined}
                    onClick={() => patch.mutate({ id: u.id, email: u.email, disabled: !u.disabled })}
                  >
                    {u.disabled ? 'Disabled — enable' : 'Active — disable'}
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <NewUserForm onCreated={() => qc.invalidateQueries({ queryKey: ['users'] })} />
    </div>
  )
}

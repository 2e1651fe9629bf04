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
}

export function UsersAdmin({ myId }: { myId: number }) {
  const qc = useQueryClient()
  const [error, setError] = useState<string | null>(null)
  const users = useQuery({ queryKey: ['users'], queryFn: () => api<{ users: UserJson[] }>('/api/users') })
  const patch = useMutation({
    mutationFn: ({ id, ...body }: { id: number; role?: Role; disabled?: boolean }) =>
      api(`/api/users/${id}`, { method: 'PATCH', json: body }),
    onSuccess: () => {
      setError(null)
      return qc.invalidateQueries({ queryKey: ['users'] })
    },
    onError: (e) => setError(e.message),
  })

  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Users</h1>
      {error && <p role="alert" className="error-text text-sm">{error}</p>}
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
                    onChange={(e) => isRole(e.target.value) && patch.mutate({ id: u.id, role: e.target.value })}
                  >
                    {ROLES.map((r) => (
                      <option key={r} value={r}>{ROLE_LABELS[r]}</option>
                    ))}
                  </select>
                </td>
                <td className="px-3 py-2">
                  <button
                    type="button"
                    className="btn"
                    disabled={u.id === myId}
                    title={u.id === myId ? 'You cannot disable yourself' : undefined}
                    onClick={() => patch.mutate({ id: u.id, disabled: !u.disabled })}
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

import { z } from 'zod'
import { ROLES } from '@/domain/roles'

export const roleSchema = z.enum(ROLES, { error: `Role must be one of ${ROLES.join(', ')}` })

export const createUserSchema = z.object({
  email: z.email('Email must be a valid address').max(200),
  name: z.string().trim().min(1, 'Name is required').max(120),
  role: roleSchema,
  password: z.string().min(10, 'Password must be at least 10 characters').max(200),
})

export const updateUserSchema = z
  .object({
    // A lone UTF-16 surrogate cannot go into the audit row's JSON (the route writes the user, then the audit row).
    name: z.string().trim().min(1, 'Name is required').max(120).refine((s) => !/\p{Cs}/u.test(s), 'Name must be valid Unicode text'),
    role: roleSchema,
    disabled: z.boolean(),
    password: z.string().min(10, 'Password must be at least 10 characters').max(200),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change')

export type CreateUserInput = z.infer<typeof createUserSchema>
export type UpdateUserInput = z.infer<typeof updateUserSchema>

import { z } from 'zod'
import { ROLES } from '@/domain/roles'
import { atMost, EMAIL_MAX } from './text'

export const roleSchema = z.enum(ROLES, { error: `Role must be one of ${ROLES.join(', ')}` })

// The length check comes first: a 300-character "address" is told it is too long, not just invalid.
const emailSchema = z.string().max(EMAIL_MAX, atMost('Email', EMAIL_MAX)).pipe(z.email('Email must be a valid address'))
const passwordSchema = z.string().min(10, 'Password must be at least 10 characters').max(200, atMost('Password', 200))

export const forgotPasswordSchema = z.object({ email: emailSchema })
export const setPasswordSchema = z.object({
  token: z.string().min(20, 'The link is incomplete').max(200, 'The link is longer than any link Mapwright sends (at most 200 characters)'),
  password: passwordSchema,
})

export const createUserSchema = z.object({
  email: emailSchema,
  name: z.string().trim().min(1, 'Name is required').max(120, atMost('Name', 120)),
  role: roleSchema,
  password: passwordSchema,
})

export const updateUserSchema = z
  .object({
    // A lone UTF-16 surrogate cannot go into the audit row's JSON (the route writes the user, then the audit row).
    name: z.string().trim().min(1, 'Name is required').max(120, atMost('Name', 120)).refine((s) => !/\p{Cs}/u.test(s), 'Name must be valid Unicode text'),
    role: roleSchema,
    disabled: z.boolean(),
    password: passwordSchema,
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change')

export type CreateUserInput = z.infer<typeof createUserSchema>
export type UpdateUserInput = z.infer<typeof updateUserSchema>

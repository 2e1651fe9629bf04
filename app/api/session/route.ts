import { withRole } from '@/app/_lib/http/access'

// GET /api/session — who is signed in: id, name and role (the same session check as every other route)
export const GET = withRole('signed-in', async (_req, { user }) => Response.json({ user: { id: user.id, name: user.name, role: user.role } }))

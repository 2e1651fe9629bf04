/** The four roles: the ids stored in users.role and the words the app shows for them. No imports, so forms, schemas and the database schema all share it. */
export const ROLES = ['admin', 'lead_engineer', 'calibration_engineer', 'test_driver'] as const
export type Role = (typeof ROLES)[number]

export const ROLE_LABELS: Readonly<Record<Role, string>> = {
  admin: 'admin',
  lead_engineer: 'lead engineer',
  calibration_engineer: 'calibration engineer',
  test_driver: 'test driver',
}

/** @example roleLabel('lead_engineer') // 'lead engineer' */
export function roleLabel(role: Role): string {
  return ROLE_LABELS[role]
}

export function isRole(s: string): s is Role {
  return ROLES.some((r) => r === s)
}

/** Who may read the audit trail: the API route, the page and the navigation all take it from here. */
export const AUDIT_READERS = ['admin', 'lead_engineer'] as const satisfies readonly Role[]

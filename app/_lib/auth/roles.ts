import { ROLE_LABELS, ROLES, type Role } from '@/db/roles'

export { ROLE_LABELS, ROLES, type Role }

export function roleLabel(role: Role): string {
  return ROLE_LABELS[role]
}

/** Roles that may change calibration data. */
export const EDITORS: readonly Role[] = ['calibration_engineer', 'lead_engineer']

/** Roles that may create and edit vehicle programs. */
export const PROGRAM_EDITORS: readonly Role[] = ['admin', 'lead_engineer', 'calibration_engineer']

/** The four roles. Plain constants (no ORM import) so forms and schemas can share them. */
export const ROLES = ['admin', 'lead_engineer', 'calibration_engineer', 'test_driver'] as const
export type Role = (typeof ROLES)[number]

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'admin',
  lead_engineer: 'lead engineer',
  calibration_engineer: 'calibration engineer',
  test_driver: 'test driver',
}

import { AUDIT_READERS, type Role } from '@/domain/roles'

export interface NavItem {
  href: string
  label: string
  roles: readonly Role[] | 'all'
}

/** The main navigation; each entry names the roles that see it (the server enforces the rest). */
export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Overview', roles: 'all' },
  { href: '/maps', label: 'Maps', roles: 'all' },
  { href: '/sets', label: 'Map sets', roles: 'all' },
  { href: '/review', label: 'Review', roles: ['lead_engineer', 'calibration_engineer'] },
  { href: '/reports', label: 'Drive reports', roles: 'all' },
  { href: '/programs', label: 'Vehicle programs', roles: 'all' },
  { href: '/admin/users', label: 'Users', roles: ['admin'] },
  { href: '/admin/mail', label: 'E-mail', roles: ['admin'] },
  { href: '/admin/audit', label: 'Audit trail', roles: AUDIT_READERS },
]

export function navFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((i) => i.roles === 'all' || i.roles.includes(role))
}

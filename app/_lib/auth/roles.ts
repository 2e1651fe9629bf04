import 'server-only'
import type { Role } from '@/domain/roles'

/** Roles that may change calibration data. */
export const EDITORS: readonly Role[] = ['calibration_engineer', 'lead_engineer']

/** Roles that may create and edit vehicle programs. */
export const PROGRAM_EDITORS: readonly Role[] = ['admin', 'lead_engineer', 'calibration_engineer']

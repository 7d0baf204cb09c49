// Who may do what on the calendar and freeze screens (the API checks the same; this only hides dead buttons).
import type { Me } from '@/shared/api';

type Roles = readonly Me['roles'][number][];

export function canBookWindows(roles: Roles): boolean {
  return roles.some((role) => role === 'engineer' || role === 'planner' || role === 'admin');
}

export function canEditFreezes(roles: Roles): boolean {
  return roles.includes('admin');
}

/** Anyone on the operator's side; a tenant-only user sees only its own windows and no tenant filter. */
export function isStaff(roles: Roles): boolean {
  return roles.some((role) => role !== 'tenant');
}

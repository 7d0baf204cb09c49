// Who sees what: a tenant-only user is scoped to its own tenant; any staff role opens everything.
import type { Me, RoleName } from '../../../shared/api';

export const STAFF_ROLES: RoleName[] = ['admin', 'engineer', 'planner', 'approver'];
/** Roles that book and edit windows (DESIGN §2). */
export const BOOKING_ROLES: RoleName[] = ['engineer', 'planner', 'admin'];

/** null = not scoped; '' = a tenant user without a tenant, who sees nothing rather than everything. */
export function tenantScopeOf(user: Me): string | null {
  const staff = user.roles.some((role) => role !== 'tenant');
  if (staff || !user.roles.includes('tenant')) return null;
  return user.tenantId ?? '';
}

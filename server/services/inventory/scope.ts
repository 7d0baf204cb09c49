// Who sees what: staff see the whole inventory; a tenant-only user sees its own tenant's part.
import type { Me } from '../../../shared/api';

/** null = everything; otherwise the tenant id the answer is limited to ('' for a tenant user with no tenant). */
export function inventoryScope(user: Me): string | null {
  // Any staff role already opens network-wide data elsewhere, so only tenant-only users are scoped.
  const staff = user.roles.some((role) => role !== 'tenant');
  if (staff || !user.roles.includes('tenant')) return null;
  // A tenant user without a tenant sees nothing rather than everything.
  return user.tenantId ?? '';
}

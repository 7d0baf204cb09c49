// User accounts that belong to tenants (tenant staff): who would be orphaned, whom a notice goes to.
import { inArray } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { users } from '../../../db/schema';

export type TenantUser = { id: string; tenantId: string | null; email: string };

/** Every account of the given tenants. */
export async function selectUsersOfTenants(db: Queryable, tenantIds: string[]): Promise<TenantUser[]> {
  return db.select({ id: users.id, tenantId: users.tenantId, email: users.email }).from(users).where(inArray(users.tenantId, tenantIds));
}

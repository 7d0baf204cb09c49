// User accounts that belong to tenants (tenant staff): who would be orphaned, whom a notice goes to.
import { and, eq, inArray, isNull } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { users } from '../../../db/schema';

/** `timeZone` is the zone the user chose, null when they read times in the network's zone. */
export type TenantUser = { id: string; tenantId: string | null; email: string; timeZone: string | null };

/** Every account of the given tenants. */
export async function selectUsersOfTenants(db: Queryable, tenantIds: string[]): Promise<TenantUser[]> {
  return db.select({ id: users.id, tenantId: users.tenantId, email: users.email, timeZone: users.timeZone }).from(users)
    .where(inArray(users.tenantId, tenantIds)).orderBy(users.id);
}

/** The accounts of the given tenants that can read a notice: not deactivated, invitation accepted. */
export async function selectActiveUsersOfTenants(db: Queryable, tenantIds: string[]): Promise<TenantUser[]> {
  return db.select({ id: users.id, tenantId: users.tenantId, email: users.email, timeZone: users.timeZone }).from(users)
    .where(and(inArray(users.tenantId, tenantIds), isNull(users.deactivatedAt), eq(users.invitationPending, false)))
    .orderBy(users.id);
}
